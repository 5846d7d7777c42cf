import { DOCUMENT_KIND_WORDS, HOLDER_SIDE_WORDS } from "@shared/words";
import { useState } from "react";
import { jurisdictionName } from "@shared/compliance/jurisdiction";
import type { DocumentDto, TransferDocumentDto } from "@shared/schemas/compliance";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/field";
import { Badge, Loading, Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { useDocuments } from "../api/documents";
import { useAttachDocument, useDetachDocument, useTransferDocuments } from "../api/transfer-compliance";
import { ExpiryBadge } from "./expiry-badge";
import { ScanList } from "./scan-list";
import { formatDateRange } from "@shared/dates";

const issuer = (d: Pick<DocumentDto, "jurisdiction">) =>
  d.jurisdiction === "US" ? "federal" : jurisdictionName(d.jurisdiction);
const validity = (d: Pick<DocumentDto, "validFrom" | "validTo">) =>
  d.validFrom || d.validTo ? `valid ${formatDateRange(d.validFrom, d.validTo)}` : "no validity dates";

function UsedDocument({
  doc,
  transferId,
  canDetach,
}: {
  doc: TransferDocumentDto;
  transferId: string;
  canDetach: boolean;
}) {
  const detach = useDetachDocument(transferId);
  const [open, setOpen] = useState(false);
  return (
    <li className="flex flex-col gap-2 border-t border-rule py-3 first:border-t-0">
      <div className="flex flex-wrap items-center gap-2">
        <span className="font-medium">
          {DOCUMENT_KIND_WORDS[doc.kind]} no. {doc.number}
        </span>
        <ExpiryBadge expiry={doc.expiry} />
        {doc.attached ? <Badge tone="neutral">Attached</Badge> : null}
      </div>
      <p className="text-sm text-ink-soft">
        {issuer(doc)}, {validity(doc)} · held by {doc.organization.name}
        {doc.holderSide ? ` (${HOLDER_SIDE_WORDS[doc.holderSide]})` : ""}
        {doc.satisfies.length
          ? ` · satisfies ${doc.satisfies.map((s) => `${s.ruleId} for ${s.scientificName}`).join("; ")}`
          : ""}
      </p>
      <div className="flex flex-wrap gap-2">
        {doc.scans ? (
          <Button variant="ghost" onClick={() => setOpen(!open)} aria-expanded={open}>
            {open ? "Hide scans" : `Scans (${doc.scans.length})`}
          </Button>
        ) : null}
        {canDetach && doc.attached && doc.abilities.edit ? (
          <Button variant="secondary" busy={detach.isPending} onClick={() => detach.mutate(doc.id)}>
            Take off this transfer
          </Button>
        ) : null}
      </div>
      {open ? <ScanList document={doc} /> : null}
    </li>
  );
}

function AttachControl({ transferId, used }: { transferId: string; used: readonly TransferDocumentDto[] }) {
  const own = useDocuments();
  const attach = useAttachDocument(transferId);
  const [chosen, setChosen] = useState("");
  const usedIds = new Set(used.filter((d) => d.attached).map((d) => d.id));
  const candidates = (own.data ?? []).filter((d) => !usedIds.has(d.id));
  if (own.isPending) return <Loading label="Loading your documents…" />;
  if (candidates.length === 0)
    return (
      <p className="text-sm text-ink-soft">
        All of your organisation's documents are attached, or it has none yet (add them on the Permits page).
      </p>
    );
  return (
    <div className="flex flex-wrap items-end gap-2">
      <div className="min-w-64 flex-1">
        <SelectField
          label="Attach one of your documents"
          value={chosen}
          onChange={(e) => setChosen(e.target.value)}
          options={[
            { value: "", label: "Choose a document" },
            ...candidates.map((d) => ({
              value: d.id,
              label: `${DOCUMENT_KIND_WORDS[d.kind]} no. ${d.number} (${issuer(d)})`,
            })),
          ]}
        />
      </div>
      <Button
        disabled={!chosen}
        busy={attach.isPending}
        onClick={() => attach.mutate(chosen, { onSuccess: () => setChosen("") })}
      >
        Attach
      </Button>
      {attach.error ? (
        <Notice tone="block" role="alert">
          {attach.error instanceof ApiError ? attach.error.message : "Not attached."}
        </Notice>
      ) : null}
    </div>
  );
}

/** The permits and certificates this transfer uses, with their scans for the parties, and attaching for the holder. */
export function TransferDocuments({ transferId, canAttach }: { transferId: string; canAttach: boolean }) {
  const docs = useTransferDocuments(transferId);
  if (docs.isPending) return <Loading label="Loading the documents…" />;
  if (docs.error)
    return (
      <Notice tone="block" role="alert">
        {(docs.error as Error).message}
      </Notice>
    );
  return (
    <div className="flex flex-col gap-3">
      {docs.data.length === 0 ? (
        <p className="text-sm text-ink-soft">No permit or certificate on file is used by this transfer yet.</p>
      ) : (
        <ul>
          {docs.data.map((doc) => (
            <UsedDocument key={doc.id} doc={doc} transferId={transferId} canDetach={canAttach} />
          ))}
        </ul>
      )}
      {canAttach ? <AttachControl transferId={transferId} used={docs.data} /> : null}
    </div>
  );
}
