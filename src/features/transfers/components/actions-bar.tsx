import { useState } from "react";
import { Link } from "react-router";
import type { TransferStatus } from "@shared/constants";
import type { TransferAbilitiesDto, TransferDto } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { TextAreaField } from "@/components/ui/field";
import { paths } from "@/config/paths";
import { ApiError } from "@/lib/api-client";
import { useTransitionTransfer } from "../api/transition-transfer";

type Step = {
  ability: keyof Pick<TransferAbilitiesDto, "submit" | "withdraw" | "confirm" | "sendBack" | "cancel" | "close">;
  to: TransferStatus;
  label: string;
  variant: "primary" | "secondary" | "danger";
  /** Steps that tell the other party "no" say why. */
  reason?: { label: string; confirm: string };
};

// The server decides which of these the caller may take (abilities); this only names them.
const STEPS: Step[] = [
  { ability: "submit", to: "awaiting_receiver", label: "Send to the receiver", variant: "primary" },
  { ability: "confirm", to: "ready", label: "Confirm and clear to travel", variant: "primary" },
  {
    ability: "sendBack",
    to: "draft",
    label: "Send back to the sender",
    variant: "secondary",
    reason: { label: "What needs to change?", confirm: "Send back" },
  },
  { ability: "withdraw", to: "draft", label: "Take back to draft", variant: "secondary" },
  { ability: "close", to: "closed", label: "Close the record", variant: "secondary" },
  {
    ability: "cancel",
    to: "cancelled",
    label: "Cancel the transfer",
    variant: "danger",
    reason: { label: "Why is it cancelled?", confirm: "Cancel the transfer" },
  },
];

const linkButton = "inline-flex min-h-11 items-center justify-center rounded-md border px-4 font-medium";

/**
 * A refusal a party may override with a reason: the temperature gate (a planning aid, not law).
 * Compliance blocks are not offered here; only an administrator can override those.
 */
function overridableBlock(error: unknown): boolean {
  if (!(error instanceof ApiError) || error.status !== 409) return false;
  const details = (error.body as { error?: Record<string, unknown> } | undefined)?.error;
  return Boolean(details && "temperature" in details && !("compliance" in details));
}

/** The buttons the caller's abilities allow, and the links to the screens where work is done. */
export function ActionsBar({ transfer: t }: { transfer: TransferDto }) {
  const transition = useTransitionTransfer(t.id);
  const [asking, setAsking] = useState<Step | null>(null);
  const [reason, setReason] = useState("");
  const [reasonError, setReasonError] = useState<string | null>(null);
  const steps = STEPS.filter((s) => t.abilities[s.ability]);
  const packingOpen = t.abilities.submit && t.packingFindings.length > 0;

  const [overrideReason, setOverrideReason] = useState("");
  const canOverride = transition.variables?.to === "ready" && overridableBlock(transition.error);

  function take(step: Step, why?: string, override = false) {
    transition.mutate(
      { to: step.to, reason: why, ...(override ? { override: true } : {}) },
      {
        onSuccess: () => {
          setAsking(null);
          setReason("");
        },
      },
    );
  }

  const links = [
    t.abilities.edit ? { to: paths.transfers.edit.href(t.id), label: "Edit the transfer" } : null,
    t.abilities.handOff !== null
      ? {
          to: paths.courier.handoff.href(t.id),
          label: t.abilities.handOff === 0 ? "Record the pickup" : "Record a handoff",
        }
      : null,
    t.abilities.checkIn ? { to: paths.transfers.checkIn.href(t.id), label: "Check the animals in" } : null,
    t.checkIn ? { to: paths.transfers.checkIn.href(t.id), label: "See what arrived" } : null,
  ].filter((l) => l !== null);

  if (steps.length === 0 && links.length === 0) return null;
  return (
    <div
      className="grid gap-3 rounded-card border border-rule bg-paper-deep/60 p-3"
      role="region"
      aria-label="What you can do now"
    >
      {transition.error ? (
        <Notice tone="block" role="alert" title="That step was not taken">
          {transition.error instanceof ApiError ? transition.error.message : "Check your connection and try again."}
        </Notice>
      ) : null}
      {canOverride ? (
        <form
          className="grid gap-2 rounded-card border border-brick-line bg-paper-card p-3"
          onSubmit={(e) => {
            e.preventDefault();
            const confirm = STEPS.find((x) => x.ability === "confirm")!;
            if (overrideReason.trim()) take(confirm, overrideReason.trim(), true);
          }}
        >
          <p className="text-sm">
            You may still confirm, if you have checked the weather yourself and the animals are packed for it. Say why:
            your reason and the temperature verdict go into the custody log for everyone on the transfer to see.
          </p>
          <TextAreaField
            label="Why it is safe to confirm anyway"
            value={overrideReason}
            maxLength={1000}
            onChange={(e) => setOverrideReason(e.target.value)}
          />
          <div>
            <Button type="submit" variant="danger" disabled={!overrideReason.trim()} busy={transition.isPending}>
              Confirm anyway, with this reason
            </Button>
          </div>
        </form>
      ) : null}
      {packingOpen ? (
        <Notice tone="caution">
          The packing below still has problems; the receiver is only asked once they are sorted out.
        </Notice>
      ) : null}
      <div className="flex flex-wrap gap-2">
        {links.map((l) => (
          <Link
            key={l.label}
            to={l.to}
            className={`${linkButton} border-fern-dark bg-fern text-paper-card hover:bg-fern-dark`}
          >
            {l.label}
          </Link>
        ))}
        {steps.map((s) => (
          <Button
            key={s.ability}
            variant={s.variant}
            busy={transition.isPending && transition.variables?.to === s.to && !asking}
            disabled={transition.isPending}
            onClick={() => {
              transition.reset();
              if (s.reason) {
                setAsking(s);
                setReasonError(null);
              } else take(s);
            }}
          >
            {s.label}
          </Button>
        ))}
      </div>
      {asking?.reason ? (
        <form
          className="grid gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            if (!reason.trim()) setReasonError("Say why, so the other party knows what to do.");
            else take(asking, reason.trim());
          }}
        >
          <TextAreaField
            label={asking.reason.label}
            value={reason}
            maxLength={1000}
            onChange={(e) => {
              setReason(e.target.value);
              setReasonError(null);
            }}
            error={reasonError ?? undefined}
            autoFocus
          />
          <div className="flex gap-2">
            <Button
              type="submit"
              variant={asking.variant === "danger" ? "danger" : "primary"}
              busy={transition.isPending}
            >
              {asking.reason.confirm}
            </Button>
            <Button type="button" variant="ghost" onClick={() => setAsking(null)}>
              Keep it as it is
            </Button>
          </div>
        </form>
      ) : null}
    </div>
  );
}
