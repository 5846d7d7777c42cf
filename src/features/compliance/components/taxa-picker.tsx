import { useState } from "react";
import { Button } from "@/components/ui/button";
import { TaxonCombobox } from "@/components/ui/taxon-combobox";
import { searchTaxa, type TaxonSearch } from "@/lib/taxa-search";

type Props = {
  label: string;
  /** Scientific names at any rank (a species, a genus, a family …). */
  value: readonly string[];
  onChange: (names: string[]) => void;
  error?: string;
  hint?: string;
  search?: TaxonSearch;
};

/**
 * A list of taxa chosen from the species catalogue, any rank: the shared species picker adds one
 * at a time (synonyms and typos are resolved by its search); each chosen name can be removed.
 * Names already on a rule that the catalogue does not hold (e.g. a suborder) stay as they are.
 */
export function TaxaPicker({ label, value, onChange, error, hint, search = searchTaxa }: Props) {
  // A new picker after each choice, empty for the next name.
  const [round, setRound] = useState(0);
  return (
    <div className="flex flex-col gap-2">
      <TaxonCombobox
        key={round}
        label={label}
        value={null}
        search={search}
        error={error}
        hint={hint}
        onChange={(taxon) => {
          if (!taxon) return;
          if (!value.includes(taxon.scientificName)) onChange([...value, taxon.scientificName]);
          setRound((n) => n + 1);
        }}
      />
      {value.length ? (
        <ul className="flex flex-wrap gap-2" aria-label={`${label}: chosen`}>
          {value.map((name) => (
            <li
              key={name}
              className="inline-flex items-center gap-1 rounded-full border border-rule bg-paper px-3 py-1 text-sm"
            >
              <i>{name}</i>
              <Button
                type="button"
                variant="ghost"
                className="!min-h-8 !px-2"
                aria-label={`Remove ${name}`}
                onClick={() => onChange(value.filter((other) => other !== name))}
              >
                ×
              </Button>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
