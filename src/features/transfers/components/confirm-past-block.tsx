import { useState } from "react";
import type { TransferDto } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { TextAreaField } from "@/components/ui/field";

/** What the confirming party may answer with a reason; compliance blocks are not among them. */
export type AnswerableBlock = { kind: "temperature"; advice: string | null } | { kind: "unverified" };

const WORDS = {
  temperature: {
    text: "You may still confirm, if you have checked the weather yourself and the animals are packed for it. Say why: your reason and the temperature verdict go into the custody log for everyone on the transfer to see.",
    label: "Why it is safe to confirm anyway",
    title: "Confirm past the temperature block?",
    logged: "Your reason and the temperature verdict go into the custody log",
  },
  unverified: {
    text: "You may still confirm once you have asked the agencies named above whether these animals may go this way. Say what they told you: your reason goes into the custody log for everyone on the transfer to see.",
    label: "What the agencies told you",
    title: "Confirm although the rules of the route are not verified?",
    logged: "Your reason and the states whose rules Hatchway has not reviewed go into the custody log",
  },
} as const;

type Props = {
  transfer: TransferDto;
  block: AnswerableBlock;
  busy: boolean;
  onConfirm: (reason: string) => void;
};

/**
 * The confirming party may go past a temperature block (a planning aid, not law) or an unverified
 * rules check (a state on the route nobody reviewed) with a reason, after a second question that
 * says what it does. Compliance blocks are not offered here: only an administrator overrides those.
 */
export function ConfirmPastBlock({ transfer: t, block, busy, onConfirm }: Props) {
  const [reason, setReason] = useState("");
  const [asking, setAsking] = useState(false);
  const words = WORDS[block.kind];

  return (
    <form
      className="grid gap-2 rounded-card border border-brick-line bg-paper-card p-3"
      onSubmit={(e) => {
        e.preventDefault();
        if (reason.trim()) setAsking(true);
      }}
    >
      <p className="text-sm">{words.text}</p>
      <TextAreaField label={words.label} value={reason} maxLength={480} onChange={(e) => setReason(e.target.value)} />
      <div>
        <Button type="submit" variant="danger" disabled={!reason.trim()} busy={busy && !asking}>
          Confirm anyway, with this reason
        </Button>
      </div>
      <ConfirmDialog
        open={asking}
        title={words.title}
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
        {block.kind === "temperature" && block.advice ? <p>The temperature check advises: {block.advice}</p> : null}
        <p>
          If you confirm anyway and nothing else blocks it, {t.number} is cleared to travel and the sender is told.{" "}
          {words.logged}, where everyone on the transfer can read them.
        </p>
        <p className="rounded-md bg-paper-deep px-3 py-2 text-sm">Your reason: {reason.trim()}</p>
      </ConfirmDialog>
    </form>
  );
}
