import { describe, expect, it } from "vitest";
import type { RegisterEventKind } from "../constants";
import { buildReport, countInCare, firstShortfall, standingEvents, statusOf, type LedgerEvent } from "./ledger";

/** mulberry32: a small seeded generator, so a failing ledger can be rebuilt from its seed. */
function seeded(seed: number) {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const day = (n: number) => new Date(Date.UTC(2024, 0, 1) + n * 86_400_000).toISOString().slice(0, 10);
const SPECIES = ["Pantherophis guttatus", "Python regius", "Pogona vitticeps", "Ambystoma mexicanum"];
const OUT_KINDS: RegisterEventKind[] = [
  "died",
  "euthanised",
  "sold",
  "given",
  "transferred_out",
  "loaned_out",
  "escaped",
  "released",
];

/**
 * A random ledger built from the lives of single animals: each animal comes in on a day (acquired
 * or hatched, in groups) and may leave later. The truth is counted from the lives themselves, not
 * from the events, so the report is checked against something it did not compute.
 */
function randomLedger(seed: number) {
  const random = seeded(seed);
  const pick = <T>(list: readonly T[]) => list[Math.floor(random() * list.length)]!;
  const entries = new Map<string, { scientificName: string }>();
  const events: LedgerEvent[] = [];
  const lives: { species: string; inOn: number; outOn: number | null }[] = [];
  let id = 0;
  const entryCount = 1 + Math.floor(random() * 12);
  for (let e = 0; e < entryCount; e++) {
    const entryId = `entry-${e}`;
    const species = pick(SPECIES);
    entries.set(entryId, { scientificName: species });
    const inOn = Math.floor(random() * 700);
    const size = 1 + Math.floor(random() * 8);
    events.push({
      id: `ev-${id++}`,
      entryId,
      kind: random() < 0.3 ? "hatched" : "acquired",
      on: day(inOn),
      count: size,
      correctsEventId: null,
    });
    const animals = Array.from({ length: size }, () => ({ species, inOn, outOn: null as number | null }));
    lives.push(...animals);
    // Some leave, a few at a time, on later days.
    let left = 0;
    let on = inOn;
    while (left < size && random() < 0.6) {
      on += Math.floor(random() * 120);
      const n = 1 + Math.floor(random() * (size - left));
      const out: LedgerEvent = {
        id: `ev-${id++}`,
        entryId,
        kind: pick(OUT_KINDS),
        on: day(on),
        count: n,
        correctsEventId: null,
      };
      // Sometimes first recorded wrong, then corrected by a later event that replaces it.
      if (random() < 0.2) {
        const wrong: LedgerEvent = { ...out, id: `ev-${id++}`, count: n + 3 };
        events.push(wrong);
        out.correctsEventId = wrong.id;
      }
      events.push(out);
      for (let k = 0; k < n; k++) animals[left + k]!.outOn = on;
      left += n;
    }
    if (random() < 0.2)
      events.push({ id: `ev-${id++}`, entryId, kind: "measured", on: day(inOn + 10), count: 0, correctsEventId: null });
    // A mistaken entry withdrawn altogether.
    if (random() < 0.15) {
      const mistake: LedgerEvent = {
        id: `ev-${id++}`,
        entryId,
        kind: "died",
        on: day(inOn),
        count: 1,
        correctsEventId: null,
      };
      events.push(mistake, {
        id: `ev-${id++}`,
        entryId,
        kind: "voided",
        on: day(inOn),
        count: 0,
        correctsEventId: mistake.id,
      });
    }
  }
  return { entries, events, lives };
}

const heldOn = (lives: { species: string; inOn: number; outOn: number | null }[], species: string, dayIndex: number) =>
  lives.filter(
    (life) => life.species === species && life.inOn <= dayIndex && (life.outOn === null || life.outOn > dayIndex),
  ).length;

describe("the yearly report's arithmetic", () => {
  // SOURCES.md, "Records and reports": count at the start + acquired + hatched − died − transferred
  // out − escaped or released = count at the end [practice]. Checked over 400 random ledgers, and
  // both ends against the animals' own lives.
  it("holds start + in − out = end on random ledgers, and both counts match the animals held", () => {
    for (let seed = 1; seed <= 400; seed++) {
      const { entries, events, lives } = randomLedger(seed);
      const fromIndex = Math.floor(seeded(seed * 7)() * 500);
      const toIndex = fromIndex + 364;
      const report = buildReport(entries, events, day(fromIndex), day(toIndex));
      for (const species of report) {
        const arithmetic =
          species.start +
          species.acquired +
          species.hatched -
          species.died -
          species.transferredOut -
          species.escapedOrReleased;
        expect(species.end, `seed ${seed} ${species.scientificName}`).toBe(arithmetic);
        expect(species.start, `seed ${seed} start`).toBe(heldOn(lives, species.scientificName, fromIndex - 1));
        expect(species.end, `seed ${seed} end`).toBe(heldOn(lives, species.scientificName, toIndex));
        expect(species.end).toBeGreaterThanOrEqual(0);
      }
      for (const species of SPECIES) {
        if (report.some((row) => row.scientificName === species)) continue;
        expect(heldOn(lives, species, toIndex), `seed ${seed} ${species} left out`).toBe(0);
      }
    }
  });

  it("gives the same report when the opening counts are summed elsewhere (the server sums them in SQL)", () => {
    for (let seed = 1; seed <= 100; seed++) {
      const { entries, events } = randomLedger(seed);
      const from = day(200);
      const to = day(564);
      const opening = new Map<string, number>();
      for (const event of standingEvents(events))
        if (event.on < from) {
          const species = entries.get(event.entryId)!.scientificName;
          opening.set(species, (opening.get(species) ?? 0) + countInCare([event]));
        }
      // Only the period's events, already standing, as the server's second query gives them.
      const inPeriod = standingEvents(events).filter((event) => event.on >= from);
      expect(buildReport(entries, inPeriod, from, to, opening), `seed ${seed}`).toEqual(
        buildReport(entries, events, from, to),
      );
    }
  });

  it("lists each counted event of the period under its column", () => {
    const entries = new Map([["a", { scientificName: "Python regius" }]]);
    const events: LedgerEvent[] = [
      { id: "1", entryId: "a", kind: "acquired", on: "2024-12-20", count: 6, correctsEventId: null },
      { id: "2", entryId: "a", kind: "sold", on: "2025-03-01", count: 2, correctsEventId: null },
      { id: "3", entryId: "a", kind: "measured", on: "2025-03-02", count: 0, correctsEventId: null },
      { id: "4", entryId: "a", kind: "died", on: "2026-01-02", count: 1, correctsEventId: null },
    ];
    // Illinois' herptile report covers the calendar year (17 Ill. Adm. Code 885.140) [published].
    const [row] = buildReport(entries, events, "2025-01-01", "2025-12-31");
    expect(row).toMatchObject({ start: 6, acquired: 0, transferredOut: 2, died: 0, end: 4 });
    expect(row!.events.map((event) => [event.id, event.column])).toEqual([["2", "transferredOut"]]);
  });
});

describe("corrections and counts", () => {
  const base: LedgerEvent[] = [
    { id: "1", entryId: "a", kind: "acquired", on: "2025-01-01", count: 6, correctsEventId: null },
    { id: "2", entryId: "a", kind: "sold", on: "2025-02-01", count: 2, correctsEventId: null },
  ];
  it("lets a correction replace an event and a withdrawal remove it, keeping both on record", () => {
    const corrected = [
      ...base,
      { id: "3", entryId: "a", kind: "sold" as const, on: "2025-02-01", count: 1, correctsEventId: "2" },
    ];
    expect(countInCare(corrected)).toBe(5);
    expect(standingEvents(corrected).map((event) => event.id)).toEqual(["1", "3"]);
    const withdrawn = [
      ...base,
      { id: "3", entryId: "a", kind: "voided" as const, on: "2025-02-01", count: 0, correctsEventId: "2" },
    ];
    expect(countInCare(withdrawn)).toBe(6);
  });
  it("refuses to take out more animals than were held on any day, back-dated or not", () => {
    expect(
      firstShortfall(base, { id: "x", entryId: "a", kind: "died", on: "2025-03-01", count: 5, correctsEventId: null }),
    ).toBe("2025-03-01");
    expect(
      firstShortfall(base, { id: "x", entryId: "a", kind: "died", on: "2025-03-01", count: 4, correctsEventId: null }),
    ).toBeNull();
    // 6 before the sale of 2: a death of 5 back-dated before it leaves the sale short.
    expect(
      firstShortfall(base, { id: "x", entryId: "a", kind: "died", on: "2025-01-15", count: 5, correctsEventId: null }),
    ).toBe("2025-02-01");
  });
  it("says what took the last animals out", () => {
    expect(statusOf(base)).toBe("in_care");
    expect(
      statusOf([
        ...base,
        { id: "3", entryId: "a", kind: "escaped", on: "2025-03-01", count: 4, correctsEventId: null },
      ]),
    ).toBe("escaped_or_released");
    expect(
      statusOf([
        { id: "1", entryId: "a", kind: "missing_on_arrival", on: "2025-01-01", count: 2, correctsEventId: null },
      ]),
    ).toBe("never_arrived");
  });
});
