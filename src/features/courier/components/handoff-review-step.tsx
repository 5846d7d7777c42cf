import { useFormContext } from "react-hook-form";
import type { HandoffReasonKey } from "@shared/constants";
import type { HandoffReview } from "@shared/custody/handoff-review";
import type { HandoffInput } from "@shared/schemas/transfer";
import { ALERT_KIND_WORDS, REASON_LABELS, REASON_REQUESTS } from "@shared/words";
import type { AlertKind } from "@shared/constants";
import { Notice } from "@/components/ui/feedback";
import { TextAreaField, TextField } from "@/components/ui/field";

export type Finding = { kind: AlertKind; message: string; reasonKey: HandoffReasonKey | null };

/**
 * What the handoff shows that the record did not expect, before it is confirmed: each finding in
 * words (it becomes an alert both parties receive), a reason where one is needed, the receiver's
 * code at a delivery, and the one confirmation.
 */
export function HandoffReviewStep({
  review,
  findings,
  askCode,
}: {
  review: HandoffReview;
  /** The findings to show: the phone's own, or the server's when it saw more. */
  findings: readonly Finding[];
  /** A delivery recorded by the courier: the receiver's one-time code may go with it. */
  askCode: boolean;
}) {
  const { register, formState } = useFormContext<HandoffInput>();
  const e = formState.errors;
  const reasonKeys = [...new Set(findings.flatMap((f) => (f.reasonKey ? [f.reasonKey] : [])))];
  return (
    <section aria-labelledby="review-title" className="grid gap-4">
      <h3 id="review-title" className="text-xl font-semibold">
        Check before you confirm
      </h3>
      {findings.length === 0 ? (
        <Notice tone="ok" title="This handoff matches the record">
          Box count and every seal you read match what the record expects.
        </Notice>
      ) : (
        <Notice tone="caution" role="status" title="These go on the record as alerts">
          <ul className="grid gap-2">
            {findings.map((f, i) => (
              <li key={i}>
                <span className="font-semibold">{ALERT_KIND_WORDS[f.kind]}:</span> {f.message}
              </li>
            ))}
          </ul>
          <p className="mt-2">The sender and the receiver get an e-mail about them as soon as you confirm.</p>
        </Notice>
      )}
      {review.notChecked.length ? (
        <ul className="grid gap-1 text-base text-ink-soft">
          {review.notChecked.map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
      ) : null}
      {reasonKeys.map((key) => (
        <TextAreaField
          key={key}
          label={REASON_LABELS[key]}
          hint={`Needed: ${REASON_REQUESTS[key]}.`}
          error={e.reasons?.[key]?.message}
          {...register(`reasons.${key}`)}
        />
      ))}
      {askCode ? (
        <TextField
          label="Receiver's one-time code (optional)"
          inputMode="numeric"
          autoComplete="one-time-code"
          hint="Ask the receiver to open the transfer in Hatchway and show a code. Without it, the delivery waits until the receiver confirms from their own account."
          error={e.receiverCode?.message}
          {...register("receiverCode", { setValueAs: (v: string | null) => (v ? v : null) })}
        />
      ) : null}
      <label className="flex min-h-14 cursor-pointer items-start gap-4 rounded-card border-2 border-fern-ring bg-fern-light p-4">
        <input
          type="checkbox"
          className="mt-1 h-8 w-8 shrink-0 accent-fern"
          aria-describedby={e.acknowledged ? "ack-error" : undefined}
          {...register("acknowledged")}
        />
        <span className="text-lg">
          I have counted the boxes and read the seals myself, and custody passes from the person releasing to the person
          receiving now.
        </span>
      </label>
      {e.acknowledged ? (
        <p id="ack-error" role="alert" className="-mt-2 font-medium text-brick">
          {e.acknowledged.message}
        </p>
      ) : null}
    </section>
  );
}
