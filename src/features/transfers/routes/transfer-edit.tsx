import { Link, useNavigate, useParams } from "react-router";
import type { TransferDto } from "@shared/schemas/transfer";
import { Loading, Notice } from "@/components/ui/feedback";
import { PageHeader } from "@/components/ui/page";
import { paths } from "@/config/paths";
import { ApiError } from "@/lib/api-client";
import { useTransfer } from "@/lib/transfer-queries";
import { useDirectoryOrganizations } from "../api/directory";
import { useUpdateTransfer } from "../api/update-transfer";
import { taxaOf, transferToInput } from "../components/transfer-form/form-values";
import { TransferForm } from "../components/transfer-form/transfer-form";

function EditForm({ transfer }: { transfer: TransferDto }) {
  const directory = useDirectoryOrganizations();
  const update = useUpdateTransfer(transfer.id);
  const navigate = useNavigate();
  if (directory.isPending) return <Loading label="Loading the organisations…" />;
  if (directory.error)
    return (
      <Notice tone="block" role="alert">
        {(directory.error as Error).message}
      </Notice>
    );
  return (
    <TransferForm
      mode="edit"
      defaultValues={transferToInput(transfer)}
      initialTaxa={taxaOf(transfer)}
      organizations={directory.data}
      senderOrganizationId={transfer.sender.organization.id}
      submitLabel="Save changes"
      onSave={async (values) => {
        // Notes the viewer cannot read are left alone rather than overwritten with nothing.
        const { privateNotes, ...rest } = values;
        const patch = transfer.abilities.readPrivateNotes ? { ...rest, privateNotes } : rest;
        try {
          await update.mutateAsync({ version: transfer.version, ...patch });
        } catch (err) {
          if (err instanceof ApiError && err.status === 409) {
            throw new ApiError(
              409,
              err.code,
              "Someone saved this transfer after you opened it. Open it again to see their changes, then redo yours.",
            );
          }
          throw err;
        }
        navigate(paths.transfers.detail.href(transfer.id));
      }}
    />
  );
}

/** Editing a transfer through the same steps as drafting it; a confirmed one goes back to the receiver. */
export function TransferEditRoute() {
  const { transferId = "" } = useParams();
  const transfer = useTransfer(transferId);
  if (transfer.isPending) return <Loading label="Loading the transfer…" />;
  if (transfer.error)
    return (
      <Notice tone="block" role="alert" title="This transfer did not load">
        {(transfer.error as Error).message}
      </Notice>
    );
  const t = transfer.data;
  return (
    <>
      <PageHeader
        title={`Edit ${t.number}`}
        eyebrow="Transfer"
        actions={
          <Link
            to={paths.transfers.detail.href(t.id)}
            className="inline-flex min-h-11 items-center px-2 font-medium text-fern underline"
          >
            Back to the transfer
          </Link>
        }
      />
      {!t.abilities.edit ? (
        <Notice tone="info" title="This transfer cannot be changed now">
          Only the sender edits a transfer, and only until the animals leave.
        </Notice>
      ) : (
        <>
          {t.status === "ready" ? (
            <div className="mb-4">
              <Notice tone="caution">
                The receiver has confirmed this transfer. A change to the animals, boxes, route or dates sends it back
                to them to confirm again.
              </Notice>
            </div>
          ) : null}
          {/* The key remounts the form when a newer version arrives, so it never edits stale values. */}
          <EditForm key={t.version} transfer={t} />
        </>
      )}
    </>
  );
}
