import { useNavigate } from "react-router";
import { Loading, Notice } from "@/components/ui/feedback";
import { PageHeader } from "@/components/ui/page";
import { paths } from "@/config/paths";
import { useViewer } from "@/lib/viewer";
import { useCreateTransfer } from "../api/create-transfer";
import { useDirectoryOrganizations } from "../api/directory";
import { blankTransfer } from "../components/transfer-form/form-values";
import { TransferForm } from "../components/transfer-form/transfer-form";

/** A new transfer, saved as a draft; sending it to the receiver is a step on its page. */
export function TransferNewRoute() {
  const viewer = useViewer();
  const directory = useDirectoryOrganizations();
  const create = useCreateTransfer();
  const navigate = useNavigate();
  const ownOrganizationId = viewer.user.organization?.id ?? null;

  if (!viewer.abilities.draftTransfers) {
    return (
      <Notice tone="info" title="Only keeper organisations draft transfers">
        Ask the sending organisation to start the transfer and add you to it.
      </Notice>
    );
  }
  if (directory.isPending) return <Loading label="Loading the organisations…" />;
  if (directory.error)
    return (
      <Notice tone="block" role="alert" title="The organisations did not load">
        {(directory.error as Error).message}
      </Notice>
    );

  const own = directory.data.find((o) => o.id === ownOrganizationId);
  return (
    <>
      <PageHeader title="New transfer" eyebrow={viewer.user.organization?.name}>
        Saved as a draft: nothing is sent to the receiver until you say so.
      </PageHeader>
      <TransferForm
        mode="create"
        defaultValues={blankTransfer(
          own ? { street: own.street, city: own.city, state: own.state, zip: own.zip } : null,
        )}
        initialTaxa={{}}
        organizations={directory.data}
        senderOrganizationId={ownOrganizationId}
        submitLabel="Save the draft"
        onSave={async (values) => {
          const transfer = await create.mutateAsync(values);
          navigate(paths.transfers.detail.href(transfer.id));
        }}
      />
    </>
  );
}
