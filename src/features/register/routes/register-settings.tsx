import { useEffect, useState } from "react";
import { Link } from "react-router";
import { Button } from "@/components/ui/button";
import { Loading, Notice } from "@/components/ui/feedback";
import { TextField } from "@/components/ui/field";
import { Card, PageHeader } from "@/components/ui/page";
import { paths } from "@/config/paths";
import { useQuarantineSettings, useSaveQuarantine } from "../api/register-report";

/** The organisation's quarantine length for new arrivals (D36). */
export function RegisterSettingsRoute() {
  const settings = useQuarantineSettings();
  const save = useSaveQuarantine();
  const [days, setDays] = useState("");
  useEffect(() => {
    if (settings.data) setDays(String(settings.data.quarantineDays));
  }, [settings.data]);
  if (settings.isPending) return <Loading label="Loading the register's settings…" />;
  if (settings.error)
    return (
      <Notice tone="block" role="alert">
        {settings.error.message}
      </Notice>
    );
  return (
    <>
      <PageHeader title="Quarantine length" eyebrow="Register">
        <Link to={paths.register} className="text-fern underline">
          Back to the register
        </Link>
      </PageHeader>
      <Card title="New arrivals">
        <form
          className="grid max-w-xl gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            save.mutate(Number(days));
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
            error={save.error ? save.error.message : undefined}
            hint="Applies to arrivals from now on; animals already in quarantine keep their dates."
          />
          <div>
            <Button type="submit" busy={save.isPending}>
              Save the quarantine length
            </Button>
          </div>
          {save.isSuccess ? (
            <p role="status" className="text-sm">
              Saved: {settings.data.quarantineDays} days.
            </p>
          ) : null}
        </form>
      </Card>
    </>
  );
}
