import type { RunSheetInput, RunSheetStop } from "./run-sheet.pdf";

/** Invented stops along I-40 for the run sheet's test and benchmark. */
const TOWNS = [
  ["Knoxville, TN 37917", "America/New_York"],
  ["Nashville, TN 37203", "America/Chicago"],
  ["Memphis, TN 38103", "America/Chicago"],
  ["Little Rock, AR 72201", "America/Chicago"],
] as const;
const SPECIES: [string, boolean | null][] = [
  ["Pantherophis guttatus", false],
  ["Python regius", false],
  ["Crotalus atrox", true],
  ["Eublepharis macularius", null],
];

/**
 * A run of `stops` stops (pickups then drop-offs of `stops / 2` transfers) carrying `boxes` boxes
 * in all, two species per box. Times an hour apart from 2026-12-14 13:00 UTC.
 */
export function buildRunSheetInput(stops = 6, boxes = 6): RunSheetInput {
  const transfers = Math.max(1, Math.floor(stops / 2));
  const boxesOf = (t: number) =>
    Array.from({ length: Math.floor(boxes / transfers) + (t < boxes % transfers ? 1 : 0) }, (_, b) => ({
      label: `Box ${b + 1}`,
      sealNumber: `SEAL-${t + 1}-${b + 1}`,
      contents: [0, 1].map((k) => {
        const [scientificName, venomous] = SPECIES[(t + b + k) % SPECIES.length]!;
        return { scientificName, count: 1 + ((t + k) % 3), venomous };
      }),
    }));
  const start = Date.parse("2026-12-14T13:00:00Z");
  const list: RunSheetStop[] = Array.from({ length: transfers * 2 }, (_, i) => {
    const t = i % transfers;
    const [address, timeZone] = TOWNS[i % TOWNS.length]!;
    return {
      kind: i < transfers ? "pickup" : "dropoff",
      arriveAt: new Date(start + i * 3_600_000).toISOString(),
      leaveAt: new Date(start + i * 3_600_000 + 20 * 60_000).toISOString(),
      timeZone,
      transferNumber: `HW-2026-${String(1000 + t)}`,
      address: `${100 + i} Test Road, ${address}`,
      organizationName: `Invented Keepers ${t + 1}`,
      contactName: `Keeper ${t + 1}`,
      phone: "(615) 555-0100",
      boxes: boxesOf(t),
    };
  });
  return {
    courierName: "Nightjar Test Couriers",
    departAt: new Date(start).toISOString(),
    timeZone: "America/New_York",
    vehicle: "Climate-controlled, set 68–78 °F",
    drivers: ["Dana Driver"],
    drivingH: 9.4,
    roadKm: 910,
    finishAt: new Date(start + transfers * 2 * 3_600_000).toISOString(),
    guidance: "Rests are planning guidance (49 CFR 395.3).",
    stops: list,
    rests: [
      {
        title: "30-minute break: 8 hours of driving since the last break",
        startAt: new Date(start + 8 * 3_600_000).toISOString(),
        endAt: new Date(start + 8.5 * 3_600_000).toISOString(),
        afterStop: 2,
        timeZone: "America/Chicago",
      },
    ],
    states: [
      {
        name: "Federal law",
        code: "US",
        requirements: ["HW-2026-1000: Advice. Mark each box. (50 CFR 14.81)"],
        notReviewed: "Its rules have not been reviewed in Hatchway's library.",
      },
      { name: "Tennessee", code: "TN", requirements: [], notReviewed: null },
      {
        name: "Arkansas",
        code: "AR",
        requirements: [],
        notReviewed: "Its rules have not been reviewed in Hatchway's library. Ask the state's wildlife agency.",
      },
    ],
    generatedAt: new Date(start - 86_400_000).toISOString(),
  };
}
