import { DOCUMENT_KIND_WORDS } from "@shared/words";
import { useState } from "react";
import { jurisdictionName } from "@shared/compliance/jurisdiction";
import type { DocumentDto } from "@shared/schemas/compliance";
import { Button } from "@/components/ui/button";
import { EmptyState, Loading, Notice } from "@/components/ui/feedback";
import { Card, PageHeader } from "@/components/ui/page";
import { Table, Td, Th } from "@/components/ui/table";
import { useViewer } from "@/lib/viewer";
import { useDocuments } from "../api/documents";
import { DocumentForm } from "../components/document-form";
import { ExpiryBadge } from "../components/expiry-badge";
import { ScanList } from "../components/scan-list";
import { formatDateRange } from "@shared/dates";

function DocumentRow({ doc, onEdit }: { doc: DocumentDto; onEdit: () => void }) {
  const [showScans, setShowScans] = useState(false);
  const species = doc.details?.speciesCovered ?? [];
  return (
    <>
      <tr>
        <Td className="font-medium">
          {DOCUMENT_KIND_WORDS[doc.kind]}
          <br />
          <span className="text-ink-soft">no. {doc.number}</span>
        </Td>
        <Td>{doc.jurisdiction === "US" ? "Federal" : jurisdictionName(doc.jurisdiction)}</Td>
        <Td>
          {species.length ? (
            species.map((name) => (
              <i key={name} className="block">
                {name}
              </i>
            ))
          ) : (
            <span className="text-ink-soft">—</span>
          )}
        </Td>
        <Td>
          {formatDateRange(doc.validFrom, doc.validTo, "No validity dates")}
          <div className="mt-1">
            <ExpiryBadge expiry={doc.expiry} />
          </div>
        </Td>
        <Td>
          <Button variant="ghost" onClick={() => setShowScans(!showScans)} aria-expanded={showScans}>
            {doc.scans?.length ?? 0} scan{doc.scans?.length === 1 ? "" : "s"}
          </Button>
        </Td>
        <Td className="text-right">
          {doc.abilities.edit ? (
            <Button variant="secondary" onClick={onEdit}>
              Edit
            </Button>
          ) : null}
        </Td>
      </tr>
      {showScans ? (
        <tr>
          <Td className="bg-paper" />
          <td colSpan={5} className="bg-paper px-3 py-3">
            <ScanList document={doc} />
          </td>
        </tr>
      ) : null}
    </>
  );
}

/** The organisation's permits, licences, registrations and certificates, with their scans and expiry. */
export function DocumentsRoute() {
  const viewer = useViewer();
  const docs = useDocuments();
  const [editing, setEditing] = useState<DocumentDto | "new" | null>(null);
  const holderName = viewer.user.organization?.name ?? "";

  return (
    <>
      <PageHeader
        title="Permits and certificates"
        eyebrow={viewer.user.organization?.name}
        actions={editing ? null : <Button onClick={() => setEditing("new")}>Add a document</Button>}
      >
        Import, possession and export permits, federal permits, captive-bred registrations and CVIs your organisation
        holds. The other party of a transfer sees one only when that transfer uses it.
      </PageHeader>
      {editing ? (
        <Card
          title={
            editing === "new"
              ? "New permit or certificate"
              : `Edit ${DOCUMENT_KIND_WORDS[editing.kind].toLowerCase()} no. ${editing.number}`
          }
          className="mb-6"
        >
          <DocumentForm
            key={editing === "new" ? "new" : editing.id}
            existing={editing === "new" ? undefined : editing}
            holderName={holderName}
            onDone={() => setEditing(null)}
          />
        </Card>
      ) : null}
      {docs.isPending ? (
        <Loading label="Loading the documents…" />
      ) : docs.error ? (
        <Notice tone="block" role="alert">
          {(docs.error as Error).message}
        </Notice>
      ) : docs.data.length === 0 ? (
        <EmptyState title="No permits or certificates yet">
          Add the first one with the button above; you can attach scans to it afterwards.
        </EmptyState>
      ) : (
        <Table
          caption="Permits and certificates"
          head={
            <tr>
              <Th>Document</Th>
              <Th>Issued by</Th>
              <Th>Species</Th>
              <Th>Validity</Th>
              <Th>Scans</Th>
              <Th>
                <span className="sr-only">Actions</span>
              </Th>
            </tr>
          }
        >
          {docs.data.map((doc) => (
            <DocumentRow key={doc.id} doc={doc} onEdit={() => setEditing(doc)} />
          ))}
        </Table>
      )}
    </>
  );
}
