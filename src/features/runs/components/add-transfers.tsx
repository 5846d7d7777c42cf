import { useState } from "react";
import type { RunDto, RunPatch } from "@shared/schemas/run";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { TransferPicker } from "./transfer-picker";

/** The manager adds transfers to the run; Hatchway puts each where it adds the least distance. */
export function AddTransfers({
  run,
  busy,
  onChange,
}: {
  run: RunDto;
  busy: boolean;
  onChange: (patch: RunPatch) => Promise<unknown>;
}) {
  const [chosen, setChosen] = useState<string[]>([]);
  const [asking, setAsking] = useState(false);
  const onRun = [...new Set(run.stops.map((s) => s.transferId))];
  return (
    <div className="grid gap-3">
      <TransferPicker legend="Transfers to add" chosen={chosen} onChange={setChosen} exclude={onRun} />
      <div>
        <Button variant="secondary" disabled={chosen.length === 0 || busy} onClick={() => setAsking(true)}>
          Add to the run
        </Button>
      </div>
      <ConfirmDialog
        open={asking}
        title={`Add ${chosen.length} ${chosen.length === 1 ? "transfer" : "transfers"} to the run?`}
        confirmLabel="Add them"
        busy={busy}
        onCancel={() => setAsking(false)}
        onConfirm={() =>
          void onChange({ addTransferIds: chosen, version: run.version })
            .then(() => setChosen([]))
            .finally(() => setAsking(false))
        }
      >
        <p>
          Each pickup and drop-off goes where it adds the least distance, and the stops after them are timed again.
          Where a drop-off already planned moves by more than 2 hours, Hatchway e-mails that transfer&rsquo;s sender and
          receiver.
        </p>
      </ConfirmDialog>
    </div>
  );
}
