import type { TransferDto } from "@shared/schemas/transfer";
import { DELIVERY_STATE_WORDS, DELIVERY_WAY_WORDS } from "@shared/words";
import { formatInstant } from "@shared/dates";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { useAcknowledgeDelivery, useDeliveryCode } from "@/lib/delivery";

/** The one-time code the receiver reads out to the courier at the door. */
function CodeForCourier({ transfer: t }: { transfer: TransferDto }) {
  const code = useDeliveryCode(t.id);
  return (
    <div className="grid gap-2">
      {code.data ? (
        <div role="status" className="grid gap-1 rounded-card border border-rule bg-paper-card p-3">
          <p className="text-sm">
            Read this code to the courier; it works once, until {formatInstant(code.data.expiresAt)}.
          </p>
          <p
            className="font-mono text-3xl font-bold tracking-[0.3em]"
            aria-label={`Code ${code.data.code.split("").join(" ")}`}
          >
            {code.data.code}
          </p>
        </div>
      ) : null}
      {code.error ? (
        <Notice tone="block" role="alert">
          {code.error instanceof ApiError ? code.error.message : "Check your connection and try again."}
        </Notice>
      ) : null}
      <div>
        <Button type="button" variant="secondary" busy={code.isPending} onClick={() => code.mutate()}>
          {code.data ? "Show a new code" : "Show a code for the courier"}
        </Button>
      </div>
    </div>
  );
}

/**
 * The delivery is on the record only with the receiver's word. The receiver confirms "I have the
 * boxes" here, or shows the courier a code; everyone else sees that it is awaited.
 */
export function DeliverySection({ transfer: t }: { transfer: TransferDto }) {
  const acknowledge = useAcknowledgeDelivery(t.id);
  const delivery = t.delivery;
  if (delivery?.state === "awaiting_receiver") {
    return (
      <section
        id="delivery"
        aria-labelledby="delivery-heading"
        className="grid scroll-mt-4 gap-3 rounded-card border-2 border-amber-line bg-amber-bg p-4"
      >
        <h2 id="delivery-heading" className="text-lg font-semibold">
          {DELIVERY_STATE_WORDS.awaiting_receiver}
        </h2>
        <p className="text-sm">
          {delivery.recordedBy.displayName} recorded the delivery on {formatInstant(delivery.recordedAt)}. A delivery is
          not on the record on one party&apos;s word alone:{" "}
          {t.abilities.acknowledgeDelivery
            ? "if you have the boxes, say so here, or show the courier a code for their phone. If you do not have them, call the courier and the sender now."
            : "the receiver confirms it from their account or with a one-time code."}
        </p>
        {t.abilities.acknowledgeDelivery ? (
          <div className="grid gap-3">
            {acknowledge.error ? (
              <Notice tone="block" role="alert" title="Not confirmed">
                {acknowledge.error instanceof ApiError
                  ? acknowledge.error.message
                  : "Check your connection and try again."}
              </Notice>
            ) : null}
            <div>
              <Button type="button" busy={acknowledge.isPending} onClick={() => acknowledge.mutate(undefined)}>
                I have the boxes
              </Button>
            </div>
            <CodeForCourier transfer={t} />
          </div>
        ) : null}
      </section>
    );
  }
  if (delivery?.state === "acknowledged" && t.status === "delivered") {
    return (
      <Notice tone="ok" title={DELIVERY_STATE_WORDS.acknowledged}>
        {delivery.acknowledgedBy?.displayName ?? "The receiver"} confirmed having the boxes
        {delivery.way ? ` ${DELIVERY_WAY_WORDS[delivery.way]}` : ""}
        {delivery.acknowledgedAt ? ` on ${formatInstant(delivery.acknowledgedAt)}` : ""}.
      </Notice>
    );
  }
  // Before the delivery: the receiver may have a code ready for the courier at the door.
  if (t.abilities.showDeliveryCode)
    return (
      <section id="delivery" aria-labelledby="delivery-heading" className="grid scroll-mt-4 gap-2">
        <h2 id="delivery-heading" className="text-lg font-semibold">
          When the courier arrives
        </h2>
        <p className="text-sm text-ink-soft">
          The courier records the delivery on their phone. Confirm it here afterwards, or show them a one-time code to
          type in, so the delivery is on the record with your word too.
        </p>
        <CodeForCourier transfer={t} />
      </section>
    );
  return null;
}
