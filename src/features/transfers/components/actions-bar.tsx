import { useState } from "react";
import { Link } from "react-router";
import type { TransferDto } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { Notice } from "@/components/ui/feedback";
import { TextAreaField } from "@/components/ui/field";
import { useToast } from "@/components/ui/toast";
import { paths } from "@/config/paths";
import { ApiError } from "@/lib/api-client";
import { useTransitionTransfer } from "../api/transition-transfer";
import { ConfirmPastBlock, type AnswerableBlock } from "./confirm-past-block";
import { STEPS, type Step } from "./transition-steps";

const linkButton = "inline-flex min-h-11 items-center justify-center rounded-md border px-4 font-medium";

/**
 * A refusal the confirming party may answer with a reason: the temperature gate (a planning aid,
 * not law), or an unverified compliance verdict (a state on the route whose rules Hatchway has not
 * reviewed). Compliance blocks are not offered here; only an administrator can override those.
 */
type Answer = { gate: "compliance" | "temperature"; reason: string };

/** One reason for the custody log when the receiver answered both blocks: each said in its own words. */
function reasonFor(answers: readonly Answer[]): string {
  if (answers.length === 1) return answers[0]!.reason;
  return answers
    .map(
      (a) => `${a.gate === "compliance" ? "Rules of the route" : "Temperature"}: ${a.reason.replace(/[.!?]?$/, ".")}`,
    )
    .join(" ");
}

function answerableBlock(error: unknown): AnswerableBlock | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const details = (error.body as { error?: Record<string, unknown> } | undefined)?.error;
  if (details?.acknowledgeUnverified === true) return { kind: "unverified" };
  if (!details || !("temperature" in details) || "compliance" in details) return null;
  const report = details.temperature as { advice?: { message?: string } } | undefined;
  return { kind: "temperature", advice: report?.advice?.message ?? null };
}

/** The buttons the caller's abilities allow, and the links to the screens where work is done. */
export function ActionsBar({ transfer: t }: { transfer: TransferDto }) {
  const transition = useTransitionTransfer(t.id);
  const notify = useToast();
  const [asking, setAsking] = useState<Step | null>(null);
  const [reason, setReason] = useState("");
  const [reasonError, setReasonError] = useState<string | null>(null);
  const steps = STEPS.filter((s) => t.abilities[s.ability]);
  const packingOpen = t.abilities.submit && t.packingFindings.length > 0;
  const block = transition.variables?.to === "ready" ? answerableBlock(transition.error) : null;

  // The blocks the receiver has answered on this attempt, each with its reason: an override names
  // only the blocks shown, so answering one never answers another nobody saw.
  const [answered, setAnswered] = useState<Answer[]>([]);

  function take(step: Step, why?: string, answers: Answer[] = []) {
    transition.mutate(
      {
        to: step.to,
        reason: answers.length ? reasonFor(answers) : why,
        ...(answers.length ? { override: true, overrideGates: answers.map((a) => a.gate) } : {}),
      },
      {
        onSuccess: (updated) => {
          setAsking(null);
          setReason("");
          const done = step.done(updated);
          notify(done.title, done.detail);
        },
        onError: () => setAsking(null),
      },
    );
  }

  function start(step: Step) {
    transition.reset();
    setAnswered([]);
    setReasonError(null);
    if (step.ask) setAsking(step);
    else take(step);
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
  const question = asking?.ask?.(t);
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
      {block ? (
        <ConfirmPastBlock
          key={block.kind}
          transfer={t}
          block={block}
          busy={transition.isPending}
          onConfirm={(why) => {
            const gate: Answer["gate"] = block.kind === "unverified" ? "compliance" : "temperature";
            const answers: Answer[] = [...answered.filter((a) => a.gate !== gate), { gate, reason: why }];
            setAnswered(answers);
            take(
              STEPS.find((x) => x.ability === "confirm")!,
              why,
              answers,
            );
          }}
        />
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
            onClick={() => start(s)}
          >
            {s.label}
          </Button>
        ))}
      </div>
      <ConfirmDialog
        open={asking !== null}
        title={question?.title ?? ""}
        confirmLabel={question?.confirm ?? ""}
        cancelLabel={question?.cancel}
        tone={asking?.variant === "danger" ? "danger" : "primary"}
        busy={transition.isPending}
        onCancel={() => setAsking(null)}
        onConfirm={() => {
          if (!asking) return;
          if (asking.reason && !reason.trim()) setReasonError("Say why, so the other party knows what to do.");
          else take(asking, asking.reason ? reason.trim() : undefined);
        }}
      >
        <p>{question?.happens}</p>
        {asking?.reason ? (
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
        ) : null}
      </ConfirmDialog>
    </div>
  );
}
