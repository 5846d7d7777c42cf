import { useState } from "react";
import { useSearchParams } from "react-router";
import { useRegisterLines } from "../api/register-lines";
import { Button } from "@/components/ui/button";
import { Loading, Notice } from "@/components/ui/feedback";
import { PageHeader } from "@/components/ui/page";
import { formatInstant } from "@shared/dates";
import { useViewer } from "@/lib/viewer";
import { useDirectoryOrganizations } from "../api/directory";
import { NewTransferForm } from "../components/new-transfer-form";
import { clearBrowserDraft, readBrowserDraft } from "../components/transfer-form/draft-storage";

/** A new transfer, saved as a draft; sending it to the receiver is a step on its page. */
export function TransferNewRoute() {
  const viewer = useViewer();
  const directory = useDirectoryOrganizations();
  const userId = viewer.user.id;
  // Read once: the form keeps the copy up to date from here on.
  const [restored, setRestored] = useState(() => readBrowserDraft(userId));
  const [attempt, setAttempt] = useState(0);
  const ownOrganizationId = viewer.user.organization?.id ?? null;
  // Animals chosen in the register fill the lines of a fresh form (a kept copy wins).
  const [search] = useSearchParams();
  const fromRegister = restored ? null : search.get("fromRegister");
  const lines = useRegisterLines(fromRegister);

  if (!viewer.abilities.draftTransfers) {
    return (
      <Notice tone="info" title="Only keeper organisations draft transfers">
        Ask the sending organisation to start the transfer and add you to it.
      </Notice>
    );
  }
  if (directory.isPending || (fromRegister && lines.isPending))
    return <Loading label={fromRegister ? "Loading the animals you chose…" : "Loading the organisations…"} />;
  if (directory.error)
    return (
      <Notice tone="block" role="alert" title="The organisations did not load">
        {(directory.error as Error).message}
      </Notice>
    );

  const own = directory.data.find((o) => o.id === ownOrganizationId);
  const startOver = () => {
    clearBrowserDraft(userId);
    setRestored(null);
    setAttempt((n) => n + 1);
  };
  return (
    <>
      <PageHeader title="New transfer" eyebrow={viewer.user.organization?.name}>
        Saved as a draft once the route and parties are chosen; nothing is sent to the receiver until you say so.
      </PageHeader>
      {lines.error ? (
        <div className="mb-5">
          <Notice tone="block" role="alert" title="The animals from the register did not load">
            {(lines.error as Error).message}
          </Notice>
        </div>
      ) : null}
      {restored ? (
        <div className="mb-5">
          <Notice tone="info" title="Picked up where you left off">
            <p>
              What you typed was kept in this browser tab ({formatInstant(restored.keptAt)}).
              {restored.serverDraft
                ? ` The draft ${restored.serverDraft.number} is saved on Hatchway; starting over leaves it in your transfers list.`
                : ""}
            </p>
            <Button variant="secondary" className="mt-2" onClick={startOver}>
              Start over
            </Button>
          </Notice>
        </div>
      ) : null}
      <NewTransferForm
        key={attempt}
        userId={userId}
        organizations={directory.data}
        senderOrganizationId={ownOrganizationId}
        senderAddress={own ? { street: own.street, city: own.city, state: own.state, zip: own.zip } : null}
        restored={restored}
        prefill={attempt === 0 ? (lines.data ?? null) : null}
      />
    </>
  );
}
