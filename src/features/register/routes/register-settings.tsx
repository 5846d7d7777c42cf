import { useEffect, useState } from "react";
import { Link } from "react-router";
import type { QuarantineOverride } from "@shared/register/quarantine";
import { Button } from "@/components/ui/button";
import { Loading, Notice } from "@/components/ui/feedback";
import { TextField } from "@/components/ui/field";
import { Card, PageHeader } from "@/components/ui/page";
import { paths } from "@/config/paths";
import { ApiError } from "@/lib/api-client";
import { useQuarantineSettings, useSaveQuarantine } from "../api/register-report";

type Row = { name: string; days: string };

/** The error of one field of the answer, when the server named it ("overrides.1.name"). */
const fieldError = (error: unknown, field: string) =>
  error instanceof ApiError && error.field === field ? error.message : undefined;

/** The organisation's quarantine length for new arrivals, and longer ones by genus or species (D36). */
export function RegisterSettingsRoute() {
  const settings = useQuarantineSettings();
  const save = useSaveQuarantine();
  const [days, setDays] = useState("");
  const [rows, setRows] = useState<Row[]>([]);
  useEffect(() => {
    if (!settings.data) return;
    setDays(String(settings.data.quarantineDays));
    setRows(settings.data.overrides.map((o) => ({ name: o.name, days: String(o.days) })));
  }, [settings.data]);
  if (settings.isPending) return <Loading label="Loading the register's settings…" />;
  if (settings.error)
    return (
      <Notice tone="block" role="alert">
        {settings.error.message}
      </Notice>
    );
  const setRow = (i: number, change: Partial<Row>) =>
    setRows((all) => all.map((row, j) => (j === i ? { ...row, ...change } : row)));
  const overrides: QuarantineOverride[] = rows
    .filter((r) => r.name.trim() || r.days.trim())
    .map((r) => ({ name: r.name, days: Number(r.days) }));
  const generalError =
    save.error && !(save.error instanceof ApiError && save.error.field?.startsWith("overrides."))
      ? save.error.message
      : undefined;
  return (
    <>
      <PageHeader title="Quarantine length" eyebrow="Register">
        <Link to={paths.register} className="text-fern underline">
          Back to the register
        </Link>
      </PageHeader>
      <Card title="New arrivals">
        <form
          className="grid max-w-xl gap-4"
          noValidate
          onSubmit={(e) => {
            e.preventDefault();
            save.mutate({ quarantineDays: Number(days), overrides });
          }}
        >
          <p className="text-sm">
            Animals accepted at a check-in start quarantine on the day they arrive, and adding animals to a group in
            quarantine starts its clock again. 30 to 90 days is common practice, longer for boas. Your veterinarian
            decides what is right for your animals.
          </p>
          <TextField
            label="Days in quarantine"
            inputMode="numeric"
            value={days}
            onChange={(e) => setDays(e.target.value)}
            error={generalError}
            hint="Applies to arrivals from now on; animals already in quarantine keep their dates."
          />
          <fieldset className="grid gap-3">
            <legend className="font-semibold">Longer or shorter for a genus or a species</legend>
            <p className="text-sm text-ink-soft">
              A genus (“Boa”) covers all its species; a species (“Python regius”) its own setting wins over its genus.
            </p>
            {rows.map((row, i) => (
              <div
                key={i}
                className="grid items-end gap-2 rounded-md border border-rule p-3 sm:grid-cols-[1fr_8rem_auto]"
              >
                <TextField
                  label={`Genus or species ${i + 1}`}
                  value={row.name}
                  onChange={(e) => setRow(i, { name: e.target.value })}
                  error={fieldError(save.error, `overrides.${i}.name`)}
                />
                <TextField
                  label="Days"
                  inputMode="numeric"
                  value={row.days}
                  onChange={(e) => setRow(i, { days: e.target.value })}
                  error={fieldError(save.error, `overrides.${i}.days`)}
                />
                <Button
                  type="button"
                  variant="ghost"
                  aria-label={`Remove genus or species ${i + 1}`}
                  onClick={() => setRows((all) => all.filter((_, j) => j !== i))}
                >
                  Remove
                </Button>
              </div>
            ))}
            <div>
              <Button
                type="button"
                variant="secondary"
                onClick={() => setRows((all) => [...all, { name: "", days: "" }])}
              >
                Add a genus or species
              </Button>
            </div>
          </fieldset>
          <div>
            <Button type="submit" busy={save.isPending}>
              Save the quarantine lengths
            </Button>
          </div>
          {save.isSuccess ? (
            <p role="status" className="text-sm">
              Saved: {save.data.quarantineDays} days
              {save.data.overrides.length
                ? `; ${save.data.overrides.map((o) => `${o.name} ${o.days} days`).join(", ")}`
                : ""}
              .
            </p>
          ) : null}
        </form>
      </Card>
    </>
  );
}
