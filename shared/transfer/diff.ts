/** One kept edit: which field, what it was, what it became. */
export type FieldChange = { field: string; oldValue: unknown; newValue: unknown };

type Item = { id: string } & Record<string, unknown>;
export type EditableDocument = Record<string, unknown> & { containers: Item[]; animals: Item[] };

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

function diffFlat(prefix: string, before: Record<string, unknown>, after: Record<string, unknown>, out: FieldChange[]) {
  const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])].sort();
  for (const k of keys) {
    const a = before[k];
    const b = after[k];
    const path = prefix ? `${prefix}.${k}` : k;
    if (a && b && typeof a === "object" && typeof b === "object" && !Array.isArray(a) && !Array.isArray(b)) {
      diffFlat(path, a as Record<string, unknown>, b as Record<string, unknown>, out);
    } else if (!same(a, b)) {
      out.push({ field: path, oldValue: a ?? null, newValue: b ?? null });
    }
  }
}

function diffList(name: string, before: Item[], after: Item[], label: (item: Item) => string, out: FieldChange[]) {
  const old = new Map(before.map((i) => [i.id, i]));
  const next = new Map(after.map((i) => [i.id, i]));
  for (const item of before)
    if (!next.has(item.id)) out.push({ field: `${name}[${label(item)}]`, oldValue: item, newValue: null });
  for (const item of after) {
    const was = old.get(item.id);
    if (!was) out.push({ field: `${name}[${label(item)}]`, oldValue: null, newValue: item });
    else {
      const { id: _a, ...a } = was;
      const { id: _b, ...b } = item;
      diffFlat(`${name}[${label(item)}]`, a, b, out);
    }
  }
}

/**
 * The field-by-field difference between two versions of a transfer's editable content.
 * Boxes and animal lines are matched by id, so a moved or renamed line shows as a change
 * of that line, and added or removed lines show whole.
 */
export function diffTransferDocuments(
  before: EditableDocument,
  after: EditableDocument,
  labels: { container: (c: Item) => string; animal: (a: Item) => string },
): FieldChange[] {
  const out: FieldChange[] = [];
  const { containers: bc, animals: ba, ...bs } = before;
  const { containers: ac, animals: aa, ...as } = after;
  diffFlat("", bs, as, out);
  diffList("containers", bc, ac, labels.container, out);
  diffList("animals", ba, aa, labels.animal, out);
  return out;
}

/** The top-level field a change belongs to ("animals[…].count" → "animals"). */
export function topLevelField(field: string): string {
  return field.split(/[.[]/)[0] ?? field;
}
