import { useState } from "react";
import type { TransferDto } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { TextField } from "@/components/ui/field";
import { ApiError } from "@/lib/api-client";
import { useAcknowledgeDelivery } from "@/lib/delivery";

/**
 * The delivery is recorded but the receiver has not confirmed it: the receiver confirms in their own
 * account, or shows a one-time code there that the courier types here.
 */
export function DeliveryCodeEntry({ transfer: t }: { transfer: TransferDto }) {
  const acknowledge = useAcknowledgeDelivery(t.id);
  const [code, setCode] = useState("");
  return (
    <section
      aria-labelledby="code-title"
      className="grid gap-3 rounded-card border-2 border-amber-line bg-amber-bg p-4"
    >
      <h2 id="code-title" className="text-xl font-semibold">
        Waiting for the receiver&apos;s confirmation
      </h2>
      <p className="text-base">
        The delivery is recorded on your word only. Ask the receiver to open this transfer in Hatchway and either
        confirm “I have the boxes” there, or show you a one-time code to type here.
      </p>
      <form
        className="grid gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          if (code.trim()) acknowledge.mutate(code.trim());
        }}
      >
        <TextField
          label="Receiver's one-time code"
          inputMode="numeric"
          autoComplete="one-time-code"
          value={code}
          onChange={(e) => {
            setCode(e.target.value);
            // The old refusal goes as soon as the code is being typed again.
            if (acknowledge.error) acknowledge.reset();
          }}
          error={acknowledge.error instanceof ApiError ? acknowledge.error.message : undefined}
        />
        {acknowledge.error && !(acknowledge.error instanceof ApiError) ? (
          <Notice tone="block" role="alert">
            No connection. Try again when you have signal.
          </Notice>
        ) : null}
        <Button type="submit" size="lg" busy={acknowledge.isPending} disabled={!code.trim()}>
          Confirm with the receiver&apos;s code
        </Button>
      </form>
    </section>
  );
}
