import { useForm } from "react-hook-form";
import { keeperResolver } from "@/lib/form-resolver";
import type { z } from "zod";
import { overrideInputSchema } from "@shared/schemas/compliance";
import { Button } from "@/components/ui/button";
import { TextAreaField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { useOverrideCompliance } from "../api/transfer-compliance";

type FormIn = z.input<typeof overrideInputSchema>;
type FormOut = z.output<typeof overrideInputSchema>;

/** The admin's override of a blocked or documents-needed verdict: a reason is required and goes into the custody trail. */
export function OverrideForm({ transferId }: { transferId: string }) {
  const override = useOverrideCompliance(transferId);
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: keeperResolver(overrideInputSchema),
    defaultValues: { reason: "" },
  });
  const submit = form.handleSubmit(({ reason }) => override.mutate(reason));
  return (
    <form
      onSubmit={submit}
      noValidate
      className="flex flex-col gap-3 rounded-card border border-brick-line bg-brick-bg/40 p-4"
    >
      <p className="text-sm font-semibold">Administrator override</p>
      <p className="text-sm text-ink-soft">
        Lets the receiver confirm this version of the transfer despite the verdict. Any later change to the transfer
        ends the override. The reason is kept in the custody trail for good.
      </p>
      {override.error ? (
        <Notice tone="block" role="alert">
          {override.error instanceof ApiError ? override.error.message : "The override was not recorded."}
        </Notice>
      ) : null}
      <TextAreaField label="Reason" error={form.formState.errors.reason?.message} {...form.register("reason")} />
      <Button type="submit" variant="danger" className="self-start" busy={override.isPending}>
        Override with this reason
      </Button>
    </form>
  );
}
