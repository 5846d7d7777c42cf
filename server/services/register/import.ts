import type { EntityManager } from "@mikro-orm/postgresql";
import { parse as parseCsv } from "csv-parse/sync";
import { ACQUISITION_WAYS, ANIMAL_ORIGINS, SEXES } from "@shared/constants";
import { registerEntryInputSchema } from "@shared/schemas/register";
import { describeIssues } from "@shared/validation/messages";
import { ACQUISITION_WAY_WORDS, ANIMAL_ORIGIN_WORDS, SEX_WORDS } from "@shared/words";
import type { Actor } from "../../auth/actor";
import { HttpError } from "../../http/errors";
import { createEntry, registerOwner, type SuggestSpecies } from "./ledger";

/** Rows one import may hold. */
export const IMPORT_ROWS_MAX = 5000;

const key = (text: string) => text.toLowerCase().replace(/[^a-z]/g, "");

/** Column headings accepted for each field: the API's names, and the words of our own CSV export. */
const COLUMNS: Record<string, string[]> = {
  scientificName: ["scientificname", "species"],
  count: ["count", "number", "quantity"],
  sex: ["sex"],
  identifier: ["identifier", "microchip", "pit", "id"],
  origin: ["origin"],
  hatchDate: ["hatchdate", "hatched", "hatchorbirthdate"],
  acquiredOn: ["acquiredon", "dateacquired", "acquired"],
  acquiredHow: ["acquiredhow", "how"],
  sourceName: ["sourcename", "source", "sourceorganisation", "sourceorganization"],
  sourcePermitNumber: ["sourcepermitnumber", "permitnumber", "sourcepermit"],
  notes: ["notes", "note"],
  weightG: ["weightg", "weight", "weightatcheckin"],
};

/** A code, or the words we show for it ("Captive bred" → captive_bred). */
function codeOf<T extends string>(value: string, codes: readonly T[], words: Readonly<Record<T, string>>): string {
  const wanted = key(value);
  return codes.find((code) => key(code) === wanted || key(words[code]) === wanted) ?? value;
}

export type ImportProblem = { row: number; field: string | null; message: string };

/**
 * Reads a register CSV: a heading row, then one animal or group per row. Every row is checked
 * (the schema, then the species against the catalogue); when any row is wrong, nothing is stored
 * and each wrong row is listed with its reason. Row numbers are the spreadsheet's: the headings
 * are row 1. Otherwise all rows are stored in one transaction.
 */
export async function importRegisterCsv({
  em,
  actor,
  csv,
  suggest,
}: {
  em: EntityManager;
  actor: Actor;
  csv: string;
  suggest: SuggestSpecies;
}): Promise<{ imported: number } | { rows: ImportProblem[] }> {
  registerOwner(actor);
  let records: string[][];
  try {
    records = parseCsv(csv, { bom: true, skip_empty_lines: true, relax_column_count: true, trim: true });
  } catch (err) {
    throw new HttpError(
      400,
      "invalid_csv",
      `The file could not be read as CSV: ${(err as Error).message.slice(0, 160)}`,
    );
  }
  const [headings, ...data] = records;
  if (!headings || data.length === 0)
    throw new HttpError(
      400,
      "invalid_csv",
      "The file holds no animals: put the column headings on the first row and one animal or group on each row after it.",
    );
  if (data.length > IMPORT_ROWS_MAX)
    throw new HttpError(
      400,
      "invalid_csv",
      `The file holds ${data.length} rows; import at most ${IMPORT_ROWS_MAX} at a time.`,
    );
  const columnOf = new Map<string, number>();
  headings.forEach((heading, index) => {
    const field = Object.entries(COLUMNS).find(([, names]) => names.includes(key(heading)))?.[0];
    if (field && !columnOf.has(field)) columnOf.set(field, index);
  });
  for (const needed of ["scientificName", "count", "acquiredOn"])
    if (!columnOf.has(needed))
      throw new HttpError(
        400,
        "invalid_csv",
        `The headings row has no “${needed}” column. Columns: ${Object.keys(COLUMNS).join(", ")}.`,
      );

  const problems: ImportProblem[] = [];
  const inputs: { row: number; input: ReturnType<typeof registerEntryInputSchema.parse> }[] = [];
  data.forEach((cells, index) => {
    const row = index + 2;
    const cell = (field: string) => {
      const at = columnOf.get(field);
      const value = at === undefined ? "" : (cells[at] ?? "").trim();
      // A cell our export neutralised (a leading apostrophe) reads as what it said.
      return value.startsWith("'") ? value.slice(1) : value;
    };
    const optional = (field: string) => cell(field) || undefined;
    const source =
      optional("sourceName") || optional("sourcePermitNumber")
        ? { name: optional("sourceName") ?? null, permitNumber: optional("sourcePermitNumber") ?? null }
        : undefined;
    const count = cell("count");
    const weight = cell("weightG");
    const candidate = {
      scientificName: cell("scientificName"),
      count: /^\d+$/.test(count) ? Number(count) : count,
      sex: optional("sex") && codeOf(cell("sex"), SEXES, SEX_WORDS),
      identifier: optional("identifier"),
      origin: optional("origin") && codeOf(cell("origin"), ANIMAL_ORIGINS, ANIMAL_ORIGIN_WORDS),
      hatchDate: optional("hatchDate"),
      acquiredOn: cell("acquiredOn"),
      acquiredHow: optional("acquiredHow") && codeOf(cell("acquiredHow"), ACQUISITION_WAYS, ACQUISITION_WAY_WORDS),
      source,
      notes: optional("notes"),
      weightG: weight === "" ? undefined : Number.isFinite(Number(weight)) ? Number(weight) : weight,
    };
    const parsed = registerEntryInputSchema.safeParse(
      Object.fromEntries(Object.entries(candidate).filter(([, value]) => value !== undefined && value !== "")),
    );
    if (!parsed.success) {
      const { field, message } = describeIssues(parsed.error);
      problems.push({ row, field, message });
    } else inputs.push({ row, input: parsed.data });
  });
  if (problems.length) return { rows: problems };

  // Every row is stored, or none: the first refusal (an unknown species, a day to come) rolls back
  // the whole transaction and is reported with the others found the same way.
  const found: ImportProblem[] = [];
  try {
    await em.transactional(async (tx) => {
      for (const { row, input } of inputs) {
        try {
          await createEntry({
            em: tx,
            actor,
            input,
            suggest: (name) => (found.length > 20 ? Promise.resolve([]) : suggest(name)),
          });
        } catch (err) {
          if (!(err instanceof HttpError) || err.status !== 400) throw err;
          found.push({ row, field: (err.details?.field as string | undefined) ?? null, message: err.message });
        }
      }
      if (found.length) throw new RowsRefused();
      await tx.flush();
    });
  } catch (err) {
    if (err instanceof RowsRefused) return { rows: found };
    throw err;
  }
  return { imported: inputs.length };
}

class RowsRefused extends Error {}
