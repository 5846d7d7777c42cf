import { describe, expect, it } from "vitest";
import {
  ALERT_KINDS,
  ANIMAL_CLASSES,
  ANIMAL_ORIGINS,
  CHECK_IN_OUTCOMES,
  CHECK_MARKS,
  CUSTODY_KINDS,
  CHAIN_PROBLEMS,
  DELIVERY_ACKNOWLEDGEMENT_WAYS,
  DELIVERY_STATES,
  DOCUMENT_KINDS,
  EXPOSURES,
  FORECAST_UNAVAILABLE_REASONS,
  HANDOFF_KINDS,
  OFFLINE_HANDOFF_STATES,
  IDENTIFIER_KINDS,
  LENGTH_KINDS,
  ORGANIZATION_KINDS,
  OUTBOX_STATUSES,
  HANDOFF_REASON_KEYS,
  PACKING_FINDING_CODES,
  PACK_KINDS,
  PHOTO_SUBJECTS,
  PARKED_KINDS,
  PROFILE_GROUPS,
  PURPOSES,
  READING_SOURCES,
  REGISTER_CONDITIONS,
  REGISTER_ENTRY_KINDS,
  REGISTER_EVENT_KINDS,
  REGISTER_STATUSES,
  REPORT_COLUMNS,
  ACQUISITION_WAYS,
  SEXES,
  TAXON_RANKS,
  TRANSFER_LIST_ROLES,
  TRANSFER_SORT_KEYS,
  TRANSFER_STATUSES,
  TRANSPORT_MODES,
  USER_ROLES,
  ACCOUNT_TOKEN_PURPOSES,
  MAIL_CHOICES,
  VEHICLE_CONDITIONINGS,
  VIEWER_ROLES,
  WALL_MATERIALS,
  WEATHER_SCENARIOS,
} from "../constants";
import { EXPIRY_STATUSES } from "../compliance/expiry";
import { ROUTE_ROLES, UNCOVERED_REASONS } from "../compliance/coverage";
import { GOVERNS, HOLDER_SIDES, ruleEffectSchema } from "../compliance/rule";
import { SEVERITIES, VERDICTS as COMPLIANCE_VERDICTS } from "../compliance/schemas";
import { ADVICE_CODES, VERDICTS as TEMPERATURE_VERDICTS } from "../temperature/advice";
import { AIR_BANDS } from "../temperature/air-band";
import { DEFAULT_PROFILES } from "../temperature/profiles";
import { ROUTE_STOP_KINDS } from "../temperature/route";
import * as words from "./index";
import { RUN_REST_REASONS, RUN_STOP_KINDS } from "../schemas/run";

const effectKinds = ruleEffectSchema.options.map((option) => option.shape.kind.value);

/** Each enum of the product with every map that gives it words. */
const VOCABULARY: [string, readonly string[], Readonly<Record<string, string>>[]][] = [
  ["transfer status", TRANSFER_STATUSES, [words.TRANSFER_STATUS_WORDS]],
  ["run stop kind", RUN_STOP_KINDS, [words.RUN_STOP_KIND_WORDS]],
  ["run rest reason", RUN_REST_REASONS, [words.RUN_REST_WORDS]],
  ["handoff kept on a phone", OFFLINE_HANDOFF_STATES, [words.OFFLINE_HANDOFF_STATE_WORDS]],
  ["alert kind", ALERT_KINDS, [words.ALERT_KIND_WORDS]],
  ["transport mode", TRANSPORT_MODES, [words.TRANSPORT_MODE_WORDS]],
  ["purpose", PURPOSES, [words.PURPOSE_WORDS]],
  ["viewer role", VIEWER_ROLES, [words.VIEWER_ROLE_WORDS]],
  ["list role", TRANSFER_LIST_ROLES, [words.TRANSFER_LIST_ROLE_WORDS]],
  ["sort key", TRANSFER_SORT_KEYS, [words.TRANSFER_SORT_WORDS]],
  ["handoff kind", HANDOFF_KINDS, [words.HANDOFF_KIND_WORDS]],
  ["packing finding", PACKING_FINDING_CODES, [words.PACKING_FINDING_WORDS]],
  ["sex", SEXES, [words.SEX_WORDS]],
  ["animal origin", ANIMAL_ORIGINS, [words.ANIMAL_ORIGIN_WORDS]],
  ["identifier kind", IDENTIFIER_KINDS, [words.IDENTIFIER_KIND_WORDS]],
  ["length kind", LENGTH_KINDS, [words.LENGTH_KIND_WORDS]],
  ["check-in outcome", CHECK_IN_OUTCOMES, [words.CHECK_IN_OUTCOME_WORDS]],
  ["register condition", REGISTER_CONDITIONS, [words.REGISTER_CONDITION_WORDS]],
  ["register entry kind", REGISTER_ENTRY_KINDS, [words.REGISTER_ENTRY_KIND_WORDS]],
  ["register event kind", REGISTER_EVENT_KINDS, [words.REGISTER_EVENT_KIND_WORDS]],
  ["register status", REGISTER_STATUSES, [words.REGISTER_STATUS_WORDS]],
  ["report column", REPORT_COLUMNS, [words.REPORT_COLUMN_WORDS]],
  ["acquisition way", ACQUISITION_WAYS, [words.ACQUISITION_WAY_WORDS]],
  ["taxon rank", TAXON_RANKS, [words.TAXON_RANK_WORDS]],
  ["animal class", ANIMAL_CLASSES, [words.ANIMAL_CLASS_WORDS]],
  ["pack", PACK_KINDS, [words.PACK_WORDS, words.PACK_IN_SENTENCE, words.PACK_HANDLING_WORDS]],
  ["wall material", WALL_MATERIALS, [words.WALL_MATERIAL_WORDS]],
  ["organisation kind", ORGANIZATION_KINDS, [words.ORGANIZATION_KIND_WORDS]],
  ["user role", USER_ROLES, [words.USER_ROLE_WORDS]],
  ["account link purpose", ACCOUNT_TOKEN_PURPOSES, [words.ACCOUNT_TOKEN_PURPOSE_WORDS]],
  ["mail choice", MAIL_CHOICES, [words.MAIL_CHOICE_WORDS]],
  ["document kind", DOCUMENT_KINDS, [words.DOCUMENT_KIND_WORDS, words.DOCUMENT_KIND_IN_SENTENCE]],
  ["expiry", EXPIRY_STATUSES, [words.EXPIRY_WORDS]],
  ["holder side", HOLDER_SIDES, [words.HOLDER_SIDE_WORDS]],
  [
    "compliance verdict",
    COMPLIANCE_VERDICTS,
    [
      words.COMPLIANCE_VERDICT_WORDS,
      words.COMPLIANCE_VERDICT_EXPLANATIONS,
      words.COMPLIANCE_VERDICT_PRINTED,
      words.COMPLIANCE_VERDICT_ON_LABEL,
    ],
  ],
  ["place on the route", ROUTE_ROLES, [words.ROUTE_ROLE_WORDS]],
  ["why a state is not covered", UNCOVERED_REASONS, [words.UNCOVERED_REASON_WORDS]],
  ["severity", SEVERITIES, [words.SEVERITY_WORDS]],
  ["what a rule governs", GOVERNS, [words.GOVERNS_WORDS]],
  ["rule effect", effectKinds, [words.RULE_EFFECT_WORDS]],
  [
    "temperature verdict",
    TEMPERATURE_VERDICTS,
    [words.TEMPERATURE_VERDICT_WORDS, words.TEMPERATURE_VERDICT_PRINTED, words.TEMPERATURE_VERDICT_ON_LABEL],
  ],
  [
    "check on the manifest",
    ["compliance", "temperature"] as const,
    [words.MANIFEST_CHECK_WORDS, words.LABEL_CHECK_WORDS],
  ],
  ["advice", ADVICE_CODES, [words.ADVICE_WORDS]],
  ["check mark", CHECK_MARKS, [words.CHECK_MARK_WORDS]],
  ["exposure", EXPOSURES, [words.EXPOSURE_WORDS, words.EXPOSURE_IN_SENTENCE]],
  ["vehicle conditioning", VEHICLE_CONDITIONINGS, [words.VEHICLE_CONDITIONING_WORDS]],
  ["stop on a map", ROUTE_STOP_KINDS, [words.ROUTE_STOP_WORDS]],
  ["band of the air on a map", AIR_BANDS, [words.AIR_BAND_WORDS]],
  ["parked kind", PARKED_KINDS, [words.PARKED_WORDS]],
  ["reading source", READING_SOURCES, [words.READING_SOURCE_WORDS]],
  ["weather scenario", WEATHER_SCENARIOS, [words.WEATHER_SCENARIO_WORDS]],
  ["outbox status", OUTBOX_STATUSES, [words.OUTBOX_STATUS_WORDS]],
  ["custody kind", CUSTODY_KINDS, [words.CUSTODY_KIND_WORDS]],
  ["custody chain problem", CHAIN_PROBLEMS, [words.CHAIN_PROBLEM_WORDS]],
  ["photo subject", PHOTO_SUBJECTS, [words.PHOTO_SUBJECT_WORDS]],
  ["delivery state", DELIVERY_STATES, [words.DELIVERY_STATE_WORDS]],
  ["delivery acknowledgement", DELIVERY_ACKNOWLEDGEMENT_WAYS, [words.DELIVERY_WAY_WORDS]],
  ["handoff reason", HANDOFF_REASON_KEYS, [words.REASON_LABELS, words.REASON_REQUESTS, words.REASON_TITLES]],
  [
    "temperature profile group",
    PROFILE_GROUPS,
    [Object.fromEntries(PROFILE_GROUPS.map((group) => [group, DEFAULT_PROFILES[group].label]))],
  ],
];

describe("the vocabulary", () => {
  for (const [name, values, maps] of VOCABULARY) {
    it(`gives every ${name} words, and none is a code`, () => {
      for (const map of maps) {
        expect(Object.keys(map).sort()).toEqual([...values].sort());
        for (const value of values) {
          const text = map[value]!;
          expect(text.trim().length, `${name} ${value}`).toBeGreaterThan(1);
          expect(text, `${name} ${value}`).not.toContain("_");
        }
      }
    });
  }

  it("names the values of one enum apart from each other on a label", () => {
    const labels = VOCABULARY.map(([name, , [labels]]) => [name, labels!] as const).filter(
      ([name]) => name !== "what a rule governs",
    );
    for (const [name, map] of labels) {
      const texts = Object.values(map);
      expect(new Set(texts).size, name).toBe(texts.length);
    }
  });

  it("has no word map outside this list: every exported map is checked", () => {
    const checked = new Set(VOCABULARY.flatMap(([, , maps]) => maps));
    const exported = Object.entries(words).filter(
      ([name, value]) => /_WORDS$|_IN_SENTENCE$|_EXPLANATIONS$/.test(name) && typeof value === "object",
    );
    for (const [name, value] of exported) {
      if (name === "FIELD_WORDS") continue;
      expect(checked.has(value as Record<string, string>), name).toBe(true);
    }
  });

  it("calls a sex nobody has determined the same on every page: Not known", () => {
    // [practice] keepers record unsexed animals; one name for it everywhere (issue 10).
    expect(words.SEX_WORDS.unknown).toBe("Not known");
  });

  it("says why a forecast is missing for every reason", () => {
    for (const reason of FORECAST_UNAVAILABLE_REASONS) {
      const text = words.forecastUnavailableWords(reason, "HTTP 502", 16);
      expect(text).not.toContain("_");
      expect(text.length).toBeGreaterThan(10);
    }
    expect(words.forecastUnavailableWords("beyond_horizon", "", 16)).toContain("16 days");
  });
});

describe("the custody log in words", () => {
  const RAW = /\b[a-z]+_[a-z_]+\b|\bnull\b|\bundefined\b|\btrue\b|\bfalse\b|\{|\[/;

  it("says a state change with the states' words and no empty reason", () => {
    const entry = words.describeCustodyEntry(
      { kind: "status_change", payload: { from: "awaiting_receiver", to: "ready", reason: null } },
      "imperial",
    );
    // Issue 12 §4: "Status: waiting for the receiver → cleared to travel".
    expect(entry).toEqual({
      title: "State changed",
      lines: ["Status: waiting for the receiver → cleared to travel."],
    });
  });

  it("says a handoff in sentences, in the person's units", () => {
    const payload = {
      handoffIndex: 0,
      handoffKind: "pickup",
      releasedByName: "Ruth Calder",
      receivedByName: "Juno Park",
      boxesExpected: 2,
      boxesCounted: 1,
      boxCountMatches: false,
      seals: [
        { containerId: "c1", label: "D", sealNumber: "S-1", expected: "S-2", matches: false, intact: true },
        { containerId: "c3", label: "Box E", sealNumber: "S-3", expected: "S-3", matches: true, intact: true },
      ],
      sealsUnchecked: ["c2"],
      boxTempF: 95,
      place: { text: "Knoxville depot", lat: 35.96, lon: -83.92, accuracyM: 12 },
      notes: null,
      acknowledged: true,
    };
    const metric = words.describeCustodyEntry({ kind: "handoff", payload }, "metric");
    // NIST SP 811 4.2.1.1 [published]: 95 °F = 35 °C.
    expect(metric.lines).toContain("Box at 35 °C.");
    expect(metric.lines).toContain("1 of 2 boxes counted — the count differs.");
    expect(metric.lines).toContain("Pickup from the sender.");
    // Issue 12: a seal that did not match is said out loud, never summed up as intact.
    expect(metric.lines).toContain("Box D: seal S-2 → read S-1.");
    expect(metric.lines.join(" ")).not.toMatch(/all intact/);
    expect(metric.lines).toContain("Seals not checked on 1 box.");
    for (const line of metric.lines) expect(line).not.toMatch(RAW);
  });

  it("says every kind of entry without a raw code", () => {
    const samples: [string, Record<string, unknown>][] = [
      ["created", { number: "HW-2026-0001", status: "draft" }],
      ["check_in", { signedName: "Milo Faraday", summary: "All 3 animals arrived well.", discrepancies: [] }],
      ["couriers_assigned", { legs: [{ sequence: 1, courierId: "u1", courierName: "Juno Park" }] }],
      ["override", { gate: "temperature", verdict: "do_not_ship", advice: "postpone", reason: "Staffed pickup" }],
      ["override", { gate: "compliance", verdict: "needs_documents", reason: "Permit on its way", findings: [{}] }],
      ["correction", { reason: "Typo in the seal number" }],
    ];
    for (const [kind, payload] of samples) {
      const entry = words.describeCustodyEntry({ kind, payload }, "imperial");
      expect(entry.title).not.toMatch(RAW);
      for (const line of entry.lines) expect(line, kind).not.toMatch(RAW);
    }
    expect(words.describeCustodyEntry({ kind: "override", payload: samples[3]![1] }, "imperial").lines[0]).toBe(
      "Went past the temperature check, which said “Do not ship”.",
    );
  });
});

describe("custody evidence in words", () => {
  it("says the reasons given, what was not checked, and a delivery waiting for the receiver", () => {
    const entry = words.describeCustodyEntry(
      {
        kind: "handoff",
        payload: {
          handoffIndex: 1,
          handoffKind: "delivery",
          seals: [{ containerId: "c1", label: "A", sealNumber: null, expected: "S-1", matches: false, intact: false }],
          boxTempF: null,
          place: {},
          reasons: { implausibleSpeed: "The pickup time was typed wrong" },
          plausibility: { speed: { fromHandoffIndex: 0, distanceKm: 160.9344, elapsedH: 2 }, notChecked: [] },
          receiverAcknowledgement: "pending",
        },
      },
      "imperial",
    );
    expect(entry.lines).toContain("Box A: seal S-1 broken or missing.");
    expect(entry.lines).toContain("Reason for the distance covered: The pickup time was typed wrong");
    // 160.9344 km is 100 international miles exactly (NIST SP 811 B.8) [published].
    expect(entry.lines).toContain("100 mi from handoff 1 in 2 h.");
    expect(entry.lines).toContain("Recorded by the courier alone: the receiver's acknowledgement is awaited.");
  });

  it("says the receiver's acknowledgement, a photo and every check-in line's loss, notes and weight", () => {
    expect(
      words.describeCustodyEntry(
        { kind: "delivery_acknowledged", payload: { way: "one_time_code", receiverName: "Milo Faraday" } },
        "imperial",
      ).lines,
    ).toEqual(["Milo Faraday confirmed having the boxes with a one-time code on the courier's phone."]);
    expect(
      words.describeCustodyEntry(
        {
          kind: "photo_added",
          payload: { moment: "handoff", handoffIndex: 0, handoffKind: "pickup", subject: "seal", shows: "Box D" },
        },
        "imperial",
      ).lines,
    ).toEqual(["Seal at the pickup — Box D."]);
    const checkIn = words.describeCustodyEntry(
      {
        kind: "check_in",
        payload: {
          signedName: "Milo Faraday",
          summary: "4 arrived well, 1 dead on arrival.",
          lines: [
            { scientificName: "Agalychnis callidryas", deadOnArrival: 1, missing: 0, notes: "Found cold", weightG: 12 },
          ],
        },
      },
      "metric",
    );
    expect(checkIn.lines).toContain("Agalychnis callidryas: 1 dead on arrival; weight 12 g; notes: Found cold.");
  });
});

describe("the change history in words", () => {
  it("reads each change as one sentence (issue 12 §4)", () => {
    expect(
      words.changeSentence(
        { field: "containers[Turtles D].sealNumber", oldValue: "SEAL-0004", newValue: "SEAL-0044" },
        "imperial",
      ),
    ).toBe("Box Turtles D: seal SEAL-0004 → SEAL-0044");
    expect(
      words.changeSentence({ field: "mode", oldValue: "overnight_air", newValue: "ground_courier" }, "imperial"),
    ).toBe("How it travels: overnight air carrier → ground courier");
    expect(words.changeSentence({ field: "handlingNotes", oldValue: null, newValue: "Keep upright" }, "imperial")).toBe(
      "Handling notes: none → Keep upright",
    );
    expect(
      words.changeSentence(
        { field: "animals[Chrysemys picta]", oldValue: null, newValue: { taxon: "Chrysemys picta", count: 2 } },
        "imperial",
      ),
    ).toBe("Animal line “Chrysemys picta”: added (2 × Chrysemys picta)");
    // NIST SP 811 B.8 [published]: 254 mm = 10 in.
    expect(
      words.changeSentence({ field: "containers[Box A].lengthMm", oldValue: 304.8, newValue: 254 }, "imperial"),
    ).toBe("Box A: length 12 in → 10 in");
  });

  it("names the field and says both values in words and units", () => {
    expect(
      words.describeChange({ field: "mode", oldValue: "overnight_air", newValue: "ground_courier" }, "imperial"),
    ).toEqual({ what: "How it travels", was: "Overnight air carrier", now: "Ground courier" });
    // NIST SP 811 B.8 [published]: 304.8 mm = 12 in.
    expect(
      words.describeChange({ field: "containers[Box A].lengthMm", oldValue: 304.8, newValue: 254 }, "imperial"),
    ).toEqual({ what: "Box “Box A”: length", was: "12 in", now: "10 in" });
    expect(
      words.describeChange(
        { field: "animals[Pogona vitticeps].sex", oldValue: "unknown", newValue: "female" },
        "imperial",
      ),
    ).toEqual({ what: "Animal line “Pogona vitticeps”: sex", was: "Not known", now: "Female" });
    expect(words.describeChange({ field: "origin.zip", oldValue: "37902", newValue: "37919" }, "metric").what).toBe(
      "Origin ZIP code",
    );
  });

  it("says a whole line added or removed, and never shows an id", () => {
    const added = words.describeChange(
      { field: "animals[Chrysemys picta]", oldValue: null, newValue: { taxon: "Chrysemys picta", count: 2 } },
      "imperial",
    );
    expect(added).toEqual({ what: "Animal line “Chrysemys picta”", was: "nothing", now: "added: 2 × Chrysemys picta" });
    const receiver = words.describeChange(
      {
        field: "receiverOrganizationId",
        oldValue: "0190a7d2-0000-7000-8000-000000000001",
        newValue: "0190a7d2-0000-7000-8000-000000000002",
      },
      "imperial",
    );
    expect(JSON.stringify(receiver)).not.toMatch(/0190a7d2/);
  });

  it("lists the fields an edit touched in words", () => {
    expect(words.changedFieldsText(["plannedDepartureAt", "animals", "animals"])).toBe(
      "planned departure, animal lines",
    );
  });
});
