import { useState } from "react";
import type { RegisterEntryDto } from "@shared/schemas/register";
import { RECORDABLE_EVENT_KINDS, KINDS_WITH_COUNTERPARTY } from "@shared/register/ledger";
import { REGISTER_EVENT_KIND_WORDS } from "@shared/words";
import { todayUtc } from "@shared/compliance/expiry";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { SelectField, TextField } from "@/components/ui/field";
import { useRecordEvent } from "../api/register-entry";

type Kind = (typeof RECORDABLE_EVENT_KINDS)[number];

/** Records what happened to an entry: a sale (to whom, their permit), a death (cause), a weighing, a correction. */
export function EventForm({
  entry,
  corrects,
  onDone,
}: {
  entry: RegisterEntryDto;
  corrects?: string | null;
  onDone?: () => void;
}) {
  const record = useRecordEvent(entry.id);
  const [kind, setKind] = useState<Kind>(corrects ? "voided" : "measured");
  const [on, setOn] = useState(todayUtc());
  const [count, setCount] = useState(entry.kind === "individual" ? "1" : "");
  const [note, setNote] = useState("");
  const [cause, setCause] = useState("");
  const [weight, setWeight] = useState("");
  const [name, setName] = useState("");
  const [address, setAddress] = useState("");
  const [permit, setPermit] = useState("");
  const needsParty = KINDS_WITH_COUNTERPARTY.includes(kind);
  const counts = kind !== "measured" && kind !== "note" && kind !== "voided";
  const fieldError = (field: string) =>
    record.error && "field" in record.error && (record.error as { field?: string }).field === field
      ? record.error.message
      : undefined;
  return (
    <form
      className="grid gap-3 sm:grid-cols-2"
      onSubmit={(e) => {
        e.preventDefault();
        record.mutate(
          {
            kind,
            on,
            ...(counts && count ? { count: Number(count) } : {}),
            note: note || null,
            ...(kind === "died" || kind === "euthanised" ? { cause: cause || null } : {}),
            ...(kind === "measured" && weight ? { weightG: Number(weight) } : {}),
            ...(needsParty || kind === "acquired" || kind === "loan_returned"
              ? { counterparty: { name: name || null, address: address || null, permitNumber: permit || null } }
              : {}),
            ...(corrects ? { corrects } : {}),
          },
          { onSuccess: () => onDone?.() },
        );
      }}
    >
      <SelectField
        label="What happened"
        value={kind}
        onChange={(e) => setKind(e.target.value as Kind)}
        options={RECORDABLE_EVENT_KINDS.filter((k) => (corrects ? true : k !== "voided")).map((k) => ({
          value: k,
          label: REGISTER_EVENT_KIND_WORDS[k],
        }))}
      />
      <TextField
        label="Date"
        type="date"
        value={on}
        max={todayUtc()}
        onChange={(e) => setOn(e.target.value)}
        error={fieldError("on")}
      />
      {counts ? (
        <TextField
          label="Number of animals"
          inputMode="numeric"
          value={count}
          onChange={(e) => setCount(e.target.value)}
          error={fieldError("count")}
        />
      ) : null}
      {kind === "measured" ? (
        <TextField
          label="Weight (g)"
          inputMode="decimal"
          value={weight}
          onChange={(e) => setWeight(e.target.value)}
          error={fieldError("weightG")}
        />
      ) : null}
      {kind === "died" || kind === "euthanised" ? (
        <TextField label="Cause" value={cause} onChange={(e) => setCause(e.target.value)} />
      ) : null}
      {needsParty || kind === "acquired" || kind === "loan_returned" ? (
        <>
          <TextField
            label={needsParty ? "To whom" : "From whom"}
            value={name}
            onChange={(e) => setName(e.target.value)}
            error={fieldError("counterparty.name")}
          />
          <TextField label="Their address" value={address} onChange={(e) => setAddress(e.target.value)} />
          <TextField label="Their permit number" value={permit} onChange={(e) => setPermit(e.target.value)} />
        </>
      ) : null}
      <TextField label="Note" value={note} onChange={(e) => setNote(e.target.value)} />
      {record.error && !fieldError("on") && !fieldError("count") && !fieldError("counterparty.name") ? (
        <Notice tone="block" role="alert">
          {record.error.message}
        </Notice>
      ) : null}
      <div className="sm:col-span-2">
        <Button type="submit" busy={record.isPending}>
          {corrects ? "Record the correction" : "Record it"}
        </Button>
      </div>
    </form>
  );
}
