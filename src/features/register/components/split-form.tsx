import { useState } from "react";
import { useNavigate } from "react-router";
import type { RegisterEntryDto } from "@shared/schemas/register";
import { SEXES } from "@shared/constants";
import { SEX_WORDS } from "@shared/words";
import { todayUtc } from "@shared/compliance/expiry";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { SelectField, TextField } from "@/components/ui/field";
import { paths } from "@/config/paths";
import { useSplitEntry } from "../api/register-entry";

/**
 * Some animals of a group become an entry of their own ("2 of 6 hatchlings"), e.g. before a
 * sale or when one gets a microchip; the new entry keeps the group's history and opens next.
 */
export function SplitForm({ entry }: { entry: RegisterEntryDto }) {
  const split = useSplitEntry(entry.id);
  const navigate = useNavigate();
  const [count, setCount] = useState("1");
  const [on, setOn] = useState(todayUtc());
  const [identifier, setIdentifier] = useState("");
  const [sex, setSex] = useState<string>(entry.sex);
  const [note, setNote] = useState("");
  const fieldError = (field: string) =>
    split.error && (split.error as { field?: string }).field === field ? split.error.message : undefined;
  const shown = ["count", "on", "identifier"].some((field) => fieldError(field));
  return (
    <form
      className="grid gap-3 sm:grid-cols-2"
      onSubmit={(e) => {
        e.preventDefault();
        split.mutate(
          {
            count: Number(count),
            on,
            identifier: identifier || null,
            sex: sex as (typeof SEXES)[number],
            note: note || null,
          },
          { onSuccess: (view) => navigate(paths.registerEntry.href(view.entry.id)) },
        );
      }}
    >
      <p className="text-sm text-ink-soft sm:col-span-2">
        {entry.countInCare} of {entry.count} in care. The animals you take out get an entry of their own with this
        group's origin, source and quarantine; the group keeps the rest.
      </p>
      <TextField
        label="How many"
        inputMode="numeric"
        value={count}
        onChange={(e) => setCount(e.target.value)}
        error={fieldError("count")}
        hint={`1 to ${entry.countInCare}`}
      />
      <TextField
        label="Date"
        type="date"
        value={on}
        max={todayUtc()}
        onChange={(e) => setOn(e.target.value)}
        error={fieldError("on")}
      />
      <TextField
        label="Identifier (one animal)"
        value={identifier}
        onChange={(e) => setIdentifier(e.target.value)}
        error={fieldError("identifier")}
        hint="Microchip, shell notch code or photo ID"
      />
      <SelectField
        label="Sex"
        value={sex}
        onChange={(e) => setSex(e.target.value)}
        options={SEXES.map((s) => ({ value: s, label: SEX_WORDS[s] }))}
      />
      <div className="sm:col-span-2">
        <TextField label="Note" value={note} onChange={(e) => setNote(e.target.value)} />
      </div>
      {split.error && !shown ? (
        <Notice tone="block" role="alert">
          {split.error.message}
        </Notice>
      ) : null}
      <div className="sm:col-span-2">
        <Button type="submit" busy={split.isPending}>
          Split them off
        </Button>
      </div>
    </form>
  );
}
