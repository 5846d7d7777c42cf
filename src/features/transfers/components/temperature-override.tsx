import { useState } from "react";
import type { TransferDto } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { TextAreaField } from "@/components/ui/field";

type Props = {
  transfer: TransferDto;
  /** What the temperature check advised, from the refusal. */
  advice: string | null;
  busy: boolean;
  onConfirm: (reason: string) => void;
};

/**
 * The receiver may confirm past a temperature block (a planning aid, not law) with a reason, after
 * a second question that says what the override does. Compliance blocks are not offered here.
 */
export function TemperatureOverride({ transfer: t, advice, busy, onConfirm }: Props) {
  const [reason, setReason] = useState("");
  const [asking, setAsking] = useState(false);

  return (
    <form
      className="grid gap-2 rounded-card border border-brick-line bg-paper-card p-3"
      onSubmit={(e) => {
        e.preventDefault();
        if (reason.trim()) setAsking(true);
      }}
    >
      <p className="text-sm">
        You may still confirm, if you have checked the weather yourself and the animals are packed for it. Say why: your
        reason and the temperature verdict go into the custody log for everyone on the transfer to see.
      </p>
      <TextAreaField
        label="Why it is safe to confirm anyway"
        value={reason}
        maxLength={1000}
        onChange={(e) => setReason(e.target.value)}
      />
      <div>
        <Button type="submit" variant="danger" disabled={!reason.trim()} busy={busy && !asking}>
          Confirm anyway, with this reason
        </Button>
      </div>
      <ConfirmDialog
        open={asking}
        title="Confirm past the temperature block?"
        confirmLabel="Confirm anyway"
        cancelLabel="Go back"
        tone="danger"
        busy={busy}
        onCancel={() => setAsking(false)}
        onConfirm={() => {
          setAsking(false);
          onConfirm(reason.trim());
        }}
      >
        {advice ? <p>The temperature check advises: {advice}</p> : null}
        <p>
          If you confirm anyway, {t.number} is cleared to travel and the sender is told. Your reason and the temperature
          verdict go into the custody log, where everyone on the transfer can read them.
        </p>
        <p className="rounded-md bg-paper-deep px-3 py-2 text-sm">Your reason: {reason.trim()}</p>
      </ConfirmDialog>
    </form>
  );
}
