import { parseOptions } from "@/lib/form-resolver";
import { ANIMAL_CLASSES } from "@shared/constants";
import { ANIMAL_CLASS_WORDS } from "@shared/words";
import { useState, type FormEvent } from "react";
import { profileDataSchema, type ProfileData } from "@shared/temperature/profile-schema";
import type { TemperatureProfileDto } from "@shared/temperature/report";
import { Button } from "@/components/ui/button";
import { SelectField, TextAreaField, TextField } from "@/components/ui/field";
import { Badge, Loading, Notice } from "@/components/ui/feedback";
import { MeasureField } from "@/components/ui/measure-field";
import { Card, PageHeader } from "@/components/ui/page";
import { ApiError } from "@/lib/api-client";
import { formatInstant } from "@shared/dates";
import { formatTemp } from "@shared/units";
import { useUnitSystem } from "@/lib/units-preference";
import { useProfiles, useUpdateProfile } from "../api/profiles";

type Band = keyof ProfileData["bandsF"];

const BAND_FIELDS: { key: Band; label: string; hint: string }[] = [
  { key: "doNotShipBelow", label: "Do not ship below", hint: "Daytime high anywhere on the route." },
  { key: "heatPackBelow", label: "Heat pack below", hint: "From “do not ship” up to this." },
  { key: "coldPackFrom", label: "Cold pack from", hint: "Empty: never a cold pack for this group." },
  { key: "holdFrom", label: "Staffed facility only from", hint: "Up to “do not ship above”, inclusive." },
  { key: "doNotShipAbove", label: "Do not ship above", hint: "" },
];

const dataOf = (p: TemperatureProfileDto): ProfileData => ({
  label: p.label,
  animalClass: p.animalClass,
  safeTransitF: p.safeTransitF,
  bandsF: p.bandsF,
  source: p.source,
});

/** The temperature profiles every verdict uses: guideline defaults, edited by administrators. */
export function TemperatureProfilesRoute() {
  const profiles = useProfiles();
  return (
    <>
      <PageHeader title="Temperature profiles" eyebrow="Administration">
        The safe range in transit and the guideline bands for each group of species. They are guidelines, not law; every
        change applies to the next check of every transfer.
      </PageHeader>
      {profiles.isPending ? (
        <Loading />
      ) : profiles.error ? (
        <Notice tone="block" role="alert">
          {(profiles.error as Error).message}
        </Notice>
      ) : (
        <div className="grid gap-4 lg:grid-cols-2">
          {profiles.data.profiles.map((p) => (
            <ProfileCard key={p.group} profile={p} canEdit={profiles.data.abilities.edit} />
          ))}
        </div>
      )}
    </>
  );
}

function ProfileCard({ profile, canEdit }: { profile: TemperatureProfileDto; canEdit: boolean }) {
  const [system] = useUnitSystem();
  const [editing, setEditing] = useState(false);
  const b = profile.bandsF;
  return (
    <Card
      title={profile.label}
      actions={
        <span className="flex items-center gap-2">
          {profile.edited ? <Badge tone="info">Edited</Badge> : <Badge tone="neutral">Guideline default</Badge>}
          {canEdit && !editing ? (
            <Button variant="secondary" onClick={() => setEditing(true)}>
              Edit
            </Button>
          ) : null}
        </span>
      }
    >
      {editing ? (
        <ProfileForm profile={profile} onDone={() => setEditing(false)} />
      ) : (
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
          <dt className="text-ink-soft">Safe in transit</dt>
          <dd>
            {formatTemp(profile.safeTransitF.min, system)} to {formatTemp(profile.safeTransitF.max, system)}
          </dd>
          <dt className="text-ink-soft">Do not ship</dt>
          <dd>
            below {formatTemp(b.doNotShipBelow, system)} or above {formatTemp(b.doNotShipAbove, system)}
          </dd>
          <dt className="text-ink-soft">Heat pack</dt>
          <dd>below {formatTemp(b.heatPackBelow, system)}</dd>
          <dt className="text-ink-soft">Cold pack</dt>
          <dd>{b.coldPackFrom === null ? "never" : `from ${formatTemp(b.coldPackFrom, system)}`}</dd>
          <dt className="text-ink-soft">Staffed facility only</dt>
          <dd>from {formatTemp(b.holdFrom, system)}</dd>
          <dt className="text-ink-soft">Source</dt>
          <dd>{profile.source}</dd>
          {profile.updatedBy && profile.updatedAt ? (
            <>
              <dt className="text-ink-soft">Last edited</dt>
              <dd>
                {profile.updatedBy.displayName}, {formatInstant(profile.updatedAt)}
              </dd>
            </>
          ) : null}
        </dl>
      )}
    </Card>
  );
}

function ProfileForm({ profile, onDone }: { profile: TemperatureProfileDto; onDone: () => void }) {
  const [data, setData] = useState<ProfileData>(() => dataOf(profile));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const update = useUpdateProfile();
  const setBand = (key: Band, value: number | null) =>
    setData((d) => ({ ...d, bandsF: { ...d.bandsF, [key]: value } }));
  const save = (next: ProfileData) => update.mutate({ group: profile.group, data: next }, { onSuccess: onDone });

  function submit(event: FormEvent) {
    event.preventDefault();
    const result = profileDataSchema.safeParse(data, parseOptions());
    if (!result.success) {
      const found: Record<string, string> = {};
      for (const issue of result.error.issues) found[issue.path.join(".")] ??= issue.message;
      setErrors(found);
      return;
    }
    setErrors({});
    save(result.data);
  }

  const err = (key: string) =>
    errors[key] ?? (update.error instanceof ApiError && update.error.field === key ? update.error.message : undefined);
  return (
    <form className="grid gap-3" onSubmit={submit} noValidate>
      <TextField
        label="Name"
        value={data.label}
        onChange={(e) => setData({ ...data, label: e.target.value })}
        error={err("label")}
      />
      <SelectField
        label="Guideline column"
        options={ANIMAL_CLASSES.map((animalClass) => ({ value: animalClass, label: ANIMAL_CLASS_WORDS[animalClass] }))}
        value={data.animalClass}
        onChange={(e) => setData({ ...data, animalClass: e.target.value as ProfileData["animalClass"] })}
      />
      <div className="grid gap-3 sm:grid-cols-2">
        <MeasureField
          kind="temperature"
          label="Safe in transit from"
          value={data.safeTransitF.min}
          onChange={(v) => setData({ ...data, safeTransitF: { ...data.safeTransitF, min: v ?? Number.NaN } })}
          error={err("safeTransitF.min")}
        />
        <MeasureField
          kind="temperature"
          label="Safe in transit up to"
          value={data.safeTransitF.max}
          onChange={(v) => setData({ ...data, safeTransitF: { ...data.safeTransitF, max: v ?? Number.NaN } })}
          error={err("safeTransitF.max")}
        />
        {BAND_FIELDS.map((f) => (
          <MeasureField
            key={f.key}
            kind="temperature"
            label={f.label}
            value={data.bandsF[f.key]}
            onChange={(v) => setBand(f.key, f.key === "coldPackFrom" ? v : (v ?? Number.NaN))}
            error={err(`bandsF.${f.key}`)}
            hint={f.hint || undefined}
          />
        ))}
      </div>
      <TextAreaField
        label="Source"
        value={data.source}
        onChange={(e) => setData({ ...data, source: e.target.value })}
        error={err("source")}
      />
      {update.error && !(update.error instanceof ApiError && update.error.field) ? (
        <Notice tone="block" role="alert">
          {(update.error as Error).message}
        </Notice>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={update.isPending}>
          Save
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        {profile.edited ? (
          <Button type="button" variant="ghost" onClick={() => save(profile.guidelineDefault)}>
            Back to the guideline default
          </Button>
        ) : null}
      </div>
    </form>
  );
}
