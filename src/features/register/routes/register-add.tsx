import { useState } from "react";
import { useNavigate } from "react-router";
import {
  ACQUISITION_WAYS,
  ANIMAL_ORIGINS,
  SEXES,
  type AcquisitionWay,
  type AnimalOrigin,
  type Sex,
} from "@shared/constants";
import { todayUtc } from "@shared/compliance/expiry";
import { ACQUISITION_WAY_WORDS, ANIMAL_ORIGIN_WORDS, SEX_WORDS } from "@shared/words";
import type { TaxonBriefDto } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { SelectField, TextField } from "@/components/ui/field";
import { PageHeader } from "@/components/ui/page";
import { TaxonCombobox } from "@/components/ui/taxon-combobox";
import { paths } from "@/config/paths";
import { searchTaxa } from "@/lib/taxa-search";
import { useAddEntry } from "../api/register-entry";

/** Animals already in the keeper's care: one with its identifier, or a group with a count. */
export function RegisterAddRoute() {
  const add = useAddEntry();
  const navigate = useNavigate();
  const [taxon, setTaxon] = useState<TaxonBriefDto | null>(null);
  const [count, setCount] = useState("1");
  const [sex, setSex] = useState<Sex>("unknown");
  const [identifier, setIdentifier] = useState("");
  const [origin, setOrigin] = useState<AnimalOrigin | "">("");
  const [hatchDate, setHatchDate] = useState("");
  const [acquiredOn, setAcquiredOn] = useState(todayUtc());
  const [how, setHow] = useState<AcquisitionWay>("purchase");
  const [sourceName, setSourceName] = useState("");
  const [sourcePermit, setSourcePermit] = useState("");
  const [quarantine, setQuarantine] = useState(false);
  const error = add.error as (Error & { field?: string }) | null;
  const errorFor = (field: string) => (error?.field === field ? error.message : undefined);
  return (
    <>
      <PageHeader title="Add animals to the register" eyebrow="Register">
        For animals already in your care. Animals that come by transfer enter the register at check-in.
      </PageHeader>
      <form
        className="grid max-w-3xl gap-3 sm:grid-cols-2"
        onSubmit={(e) => {
          e.preventDefault();
          add.mutate(
            {
              scientificName: taxon?.scientificName ?? "",
              count: Number(count),
              sex,
              identifier: identifier || null,
              origin: origin || null,
              hatchDate: hatchDate || null,
              acquiredOn,
              acquiredHow: how,
              source:
                sourceName || sourcePermit ? { name: sourceName || null, permitNumber: sourcePermit || null } : null,
              startQuarantine: quarantine,
            },
            { onSuccess: (view) => navigate(paths.registerEntry.href(view.entry.id)) },
          );
        }}
      >
        <TaxonCombobox
          label="Species"
          value={taxon}
          search={searchTaxa}
          onChange={setTaxon}
          error={errorFor("scientificName")}
        />
        <TextField
          label="Number of animals"
          inputMode="numeric"
          value={count}
          onChange={(e) => setCount(e.target.value)}
          error={errorFor("count")}
          hint="1 for one animal with its identifier; more for a group or clutch"
        />
        <SelectField
          label="Sex"
          value={sex}
          onChange={(e) => setSex(e.target.value as Sex)}
          options={SEXES.map((s) => ({ value: s, label: SEX_WORDS[s] }))}
        />
        <TextField
          label="Identifier (microchip, PIT, shell notch or photo ID)"
          value={identifier}
          onChange={(e) => setIdentifier(e.target.value)}
          error={errorFor("identifier")}
        />
        <SelectField
          label="Origin"
          value={origin}
          onChange={(e) => setOrigin(e.target.value as AnimalOrigin | "")}
          options={[
            { value: "", label: "Not known" },
            ...ANIMAL_ORIGINS.map((o) => ({ value: o, label: ANIMAL_ORIGIN_WORDS[o] })),
          ]}
        />
        <TextField
          label="Hatched or born on"
          type="date"
          value={hatchDate}
          onChange={(e) => setHatchDate(e.target.value)}
          error={errorFor("hatchDate")}
        />
        <TextField
          label="Acquired on"
          type="date"
          value={acquiredOn}
          max={todayUtc()}
          onChange={(e) => setAcquiredOn(e.target.value)}
          error={errorFor("acquiredOn")}
        />
        <SelectField
          label="How"
          value={how}
          onChange={(e) => setHow(e.target.value as AcquisitionWay)}
          options={ACQUISITION_WAYS.map((w) => ({ value: w, label: ACQUISITION_WAY_WORDS[w] }))}
        />
        <TextField
          label="From (person or organisation)"
          value={sourceName}
          onChange={(e) => setSourceName(e.target.value)}
        />
        <TextField label="Their permit number" value={sourcePermit} onChange={(e) => setSourcePermit(e.target.value)} />
        <label className="flex min-h-11 items-center gap-2 sm:col-span-2">
          <input
            type="checkbox"
            className="h-5 w-5"
            checked={quarantine}
            onChange={(e) => setQuarantine(e.target.checked)}
          />
          New arrival: start quarantine on the day acquired
        </label>
        {error && !error.field ? (
          <Notice tone="block" role="alert">
            {error.message}
          </Notice>
        ) : null}
        <div className="sm:col-span-2">
          <Button type="submit" busy={add.isPending}>
            Add to the register
          </Button>
        </div>
      </form>
    </>
  );
}
