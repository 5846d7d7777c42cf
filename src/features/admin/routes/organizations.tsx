import { ORGANIZATION_KIND_WORDS } from "@shared/words";
import { useState } from "react";
import type { OrganizationDto } from "@shared/schemas/auth";
import { Button } from "@/components/ui/button";
import { EmptyState, Loading, Notice } from "@/components/ui/feedback";
import { Card, PageHeader } from "@/components/ui/page";
import { Table, Td, Th } from "@/components/ui/table";
import { useOrganizations } from "../api/organizations";
import { OrganizationForm } from "../components/organization-form";

export function OrganizationsRoute() {
  const orgs = useOrganizations();
  const [editing, setEditing] = useState<OrganizationDto | "new" | null>(null);

  return (
    <>
      <PageHeader
        title="Organisations"
        eyebrow="Administration"
        actions={editing ? null : <Button onClick={() => setEditing("new")}>Add organisation</Button>}
      >
        Breeders, nature centres, rescues, zoos, private keepers and courier services.
      </PageHeader>
      {editing ? (
        <Card title={editing === "new" ? "New organisation" : `Edit ${editing.name}`} className="mb-6">
          <OrganizationForm
            key={editing === "new" ? "new" : editing.id}
            existing={editing === "new" ? undefined : editing}
            onDone={() => setEditing(null)}
          />
        </Card>
      ) : null}
      {orgs.isPending ? (
        <Loading label="Loading organisations…" />
      ) : orgs.error ? (
        <Notice tone="block" role="alert">
          {(orgs.error as Error).message}
        </Notice>
      ) : orgs.data.length === 0 ? (
        <EmptyState title="No organisations yet">Add the first one with the button above.</EmptyState>
      ) : (
        <Table
          caption="Organisations"
          head={
            <tr>
              <Th>Name</Th>
              <Th>Kind</Th>
              <Th>Address</Th>
              <Th>Contact</Th>
              <Th>
                <span className="sr-only">Actions</span>
              </Th>
            </tr>
          }
        >
          {orgs.data.map((o) => (
            <tr key={o.id}>
              <Td className="font-medium">{o.name}</Td>
              <Td>{ORGANIZATION_KIND_WORDS[o.kind]}</Td>
              <Td>
                {o.address.street}, {o.address.city}, {o.address.state} {o.address.zip}
              </Td>
              <Td>
                {o.phone}
                <br />
                <span className="text-ink-soft">{o.email}</span>
              </Td>
              <Td className="text-right">
                <Button variant="secondary" onClick={() => setEditing(o)}>
                  Edit
                </Button>
              </Td>
            </tr>
          ))}
        </Table>
      )}
    </>
  );
}
