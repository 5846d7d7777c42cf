/// <reference types="vite/client" />
/**
 * Every input schema in shared/, fed bad values of every kind, answers in a keeper's words: the
 * field named, what to do, no validator wording. Schemas are found by walking the modules, so a
 * new schema is walked without being listed here.
 */
import { describe, expect, it } from "vitest";
import type { z } from "zod";
import { LIMITS } from "../constants";
import { containerInputSchema, handoffInputSchema } from "../schemas/transfer";
import { createTransferSchema } from "../schemas/transfer";
import { measure, optionalText, requiredText, text, wholeNumber } from "../schemas/common";
import { whatIfInputSchema } from "../temperature/schemas";
import { FIELD_WORDS, fieldName } from "../words/fields";
import { describeIssues, errorMapFor, inUnits, issueSentence, quantityAt, sentence } from "./messages";

/** Wording of validators that must never reach a person (issue 10, section 2). */
const VALIDATOR_WORDING = /expected|>=|<=|\bISO\b|too small|too big|invalid|received|\bNaN\b|undefined|\bnull\b/i;

type Schema = z.ZodType;
const isSchema = (value: unknown): value is Schema =>
  typeof value === "object" && value !== null && "_zod" in value && "safeParse" in value;

const modules = import.meta.glob(["../**/*.ts", "!../**/*.test.ts", "!../**/*.d.ts"], { eager: true }) as Record<
  string,
  Record<string, unknown>
>;

/** Every zod schema a shared module exports, by "module: name", plus the schemas our factories build. */
function allSchemas(): [string, Schema][] {
  const found: [string, Schema][] = [];
  for (const [file, exports] of Object.entries(modules)) {
    for (const [name, value] of Object.entries(exports)) if (isSchema(value)) found.push([`${file}: ${name}`, value]);
  }
  found.push(
    ["createTransferSchema(now)", createTransferSchema(new Date("2026-12-05T12:00:00Z"))],
    ["text()", text()],
    ["requiredText()", requiredText()],
    ["optionalText()", optionalText()],
    ["wholeNumber(1, 10)", wholeNumber(1, 10)],
    ["measure(length)", measure("length", { above: 0, max: LIMITS.wallThicknessMmMax })],
    ["measure(temperature)", measure("temperature", { min: -40, max: 160 })],
  );
  return found;
}

type Leaf = "string" | "number" | "boolean" | "enum" | "date" | "other";
type Mode = (leaf: Leaf) => unknown;

/** Bad values of every kind a person or a client can send. */
const MODES: Record<string, Mode> = {
  "wrong types": (leaf) => (leaf === "number" ? "3" : leaf === "boolean" ? "yes" : leaf === "string" ? 42 : 7),
  "empty strings": () => "",
  nulls: () => null,
  "far too long": (leaf) => (leaf === "number" ? 1e15 : "x".repeat(LIMITS.textMax * 3)),
  "far too small": (leaf) => (leaf === "number" ? -1e15 : "-"),
  "not numbers": (leaf) => (leaf === "number" ? Number.NaN : leaf === "boolean" ? 0 : {}),
  infinite: (leaf) => (leaf === "number" ? Number.POSITIVE_INFINITY : []),
  "bad dates": (leaf) => (leaf === "number" ? 1.5 : leaf === "date" ? "2026-02-30" : "31/12/2026 25:61"),
  "control characters": (leaf) => (leaf === "number" ? -0.5 : "a\u0000b"),
};

type Def = { type: string; [key: string]: unknown };
const defOf = (schema: unknown): Def => (schema as { _zod: { def: Def } })._zod.def;

/** A value shaped like the schema, every leaf replaced by the mode's bad value; unknown keys added where asked. */
function shaped(schema: unknown, mode: Mode, unknownKeys: boolean, depth = 0): unknown {
  if (depth > 12) return mode("other");
  const def = defOf(schema);
  switch (def.type) {
    case "object": {
      const shape = def.shape as Record<string, unknown>;
      const value: Record<string, unknown> = {};
      for (const [key, inner] of Object.entries(shape)) value[key] = shaped(inner, mode, unknownKeys, depth + 1);
      if (unknownKeys) value.surpriseField = 1;
      return value;
    }
    case "array":
      return [shaped(def.element, mode, unknownKeys, depth + 1)];
    case "optional":
    case "nullable":
    case "default":
    case "prefault":
    case "readonly":
    case "catch":
    case "nonoptional":
      return shaped(def.innerType, mode, unknownKeys, depth + 1);
    case "pipe":
      return shaped(def.in, mode, unknownKeys, depth + 1);
    case "union":
      return shaped((def.options as unknown[])[0], mode, unknownKeys, depth + 1);
    case "string":
      return mode(def.format === "date" || def.format === "datetime" ? "date" : "string");
    case "number":
    case "int":
      return mode("number");
    case "boolean":
      return mode("boolean");
    case "enum":
    case "literal":
      return mode("enum");
    default:
      return mode("other");
  }
}

/** What a person would read: the form's sentence (both unit systems) and the server's 400 message. */
function messagesFor(schema: Schema, value: unknown): string[] {
  const out: string[] = [];
  for (const units of ["imperial", "metric"] as const) {
    const result = schema.safeParse(value, { error: errorMapFor(units) });
    if (result.success) continue;
    out.push(...result.error.issues.map((issue) => inUnits(issue, units)), describeIssues(result.error, units).message);
  }
  const plain = schema.safeParse(value);
  if (!plain.success) out.push(...plain.error.issues.map((issue) => issue.message));
  return out;
}

/** Names and codes of ours must not show either: no snake_case and no camelCase outside the echoed “key”. */
const RAW_CODE = /\b[a-z]+_[a-z_]+\b|\b[a-z]+[A-Z][A-Za-z]*\b/;
const withoutQuotes = (message: string) => message.replace(/“[^”]*”/g, "“…”");

describe("every shared schema speaks to a keeper", () => {
  const schemas = allSchemas();

  it("finds the input schemas it is meant to walk", () => {
    const names = schemas.map(([name]) => name).join("\n");
    for (const expected of [
      "transferInputSchema",
      "handoffInputSchema",
      "checkInInputSchema",
      "organizationInputSchema",
      "documentInputSchema",
      "whatIfInputSchema",
      "profileDataSchema",
      "ruleVersionInputSchema",
      "loginSchema",
    ])
      expect(names).toContain(expected);
    expect(schemas.length).toBeGreaterThan(40);
  });

  for (const [modeName, mode] of Object.entries(MODES)) {
    it(`answers ${modeName} in plain words`, () => {
      let seen = 0;
      for (const [name, schema] of schemas) {
        for (const unknownKeys of [false, true]) {
          for (const message of messagesFor(schema, shaped(schema, mode, unknownKeys))) {
            seen++;
            expect(message, `${name}: ${message}`).not.toMatch(VALIDATOR_WORDING);
            expect(withoutQuotes(message), `${name}: ${message}`).not.toMatch(RAW_CODE);
            expect(message.trim().length, name).toBeGreaterThan(3);
          }
        }
      }
      expect(seen).toBeGreaterThan(100);
    });
  }

  it("answers a missing body and a body of the wrong kind", () => {
    for (const [name, schema] of schemas) {
      for (const value of [undefined, null, "just text", 12, [], true]) {
        for (const message of messagesFor(schema, value)) {
          expect(message, `${name}: ${message}`).not.toMatch(VALIDATOR_WORDING);
          expect(withoutQuotes(message), `${name}: ${message}`).not.toMatch(RAW_CODE);
        }
      }
    }
  });

  it("names every field of every schema in words, never by its key", () => {
    const keys = new Set<string>();
    const collect = (schema: unknown, depth = 0) => {
      if (depth > 12 || !isSchema(schema)) return;
      const def = defOf(schema);
      if (def.type === "object")
        for (const [key, inner] of Object.entries(def.shape as Record<string, unknown>)) {
          keys.add(key);
          collect(inner, depth + 1);
        }
      for (const inner of [def.element, def.innerType, def.in, def.out, ...((def.options as unknown[]) ?? [])])
        collect(inner, depth + 1);
    };
    for (const [, schema] of schemas) collect(schema);
    const missing = [...keys].filter((key) => FIELD_WORDS[key] === undefined);
    expect(missing, "keys without words in shared/words/fields.ts").toEqual([]);
    for (const key of keys) expect(fieldName([key]), key).not.toMatch(RAW_CODE);
  });
});

describe("a measurement's limit in the person's units", () => {
  const box = {
    key: "a",
    label: "Box A",
    lengthMm: 400,
    widthMm: 300,
    heightMm: 250,
    wallMaterial: "eps",
    wallThicknessMm: 25,
    pack: "none",
  };

  it("says a wall of 99 in is over 7.9 in, and a wall of 2,514.6 mm is over 200 mm", () => {
    // NIST SP 811 B.8 [published]: 99 in = 2514.6 mm; the limit 200 mm = 7.874 in, shown to one decimal.
    const result = containerInputSchema.safeParse({ ...box, wallThicknessMm: 2514.6 });
    expect(result.success).toBe(false);
    const error = (result as { error: z.ZodError }).error;
    expect(describeIssues(error, "imperial")).toEqual({
      field: "wallThicknessMm",
      message: "Wall thickness: use at most 7.9 in.",
    });
    expect(describeIssues(error, "metric").message).toBe("Wall thickness: use at most 200 mm.");
    // The form's own parse in inches gives the same sentence.
    const inForm = containerInputSchema.safeParse(
      { ...box, wallThicknessMm: 2514.6 },
      { error: errorMapFor("imperial") },
    );
    expect((inForm as { error: z.ZodError }).error.issues[0]?.message).toBe("Wall thickness: use at most 7.9 in.");
  });

  it("accepts the limit as the message shows it, in either system", () => {
    // 7.9 in = 200.66 mm (NIST SP 811 B.8) [published]: a form that says "at most 7.9 in" takes 7.9 in.
    expect(containerInputSchema.safeParse({ ...box, wallThicknessMm: 200.66 }).success).toBe(true);
    expect(containerInputSchema.safeParse({ ...box, wallThicknessMm: 200 }).success).toBe(true);
    expect(containerInputSchema.safeParse({ ...box, wallThicknessMm: 203.2 }).success).toBe(false);
  });

  it("says a box temperature limit in °C to a person who reads °C", () => {
    // NIST SP 811 4.2.1.1 [published]: 160 °F = 71.1 °C.
    const handoff = handoffInputSchema.safeParse({
      handoffIndex: 0,
      boxesCounted: 1,
      seals: [],
      boxTempF: 200,
      place: {},
      releasedByName: "A",
      receivedByName: "B",
      acknowledged: true,
    });
    const error = (handoff as { error: z.ZodError }).error;
    expect(describeIssues(error, "metric").message).toBe("Box temperature: use at most 71.1 °C.");
    expect(describeIssues(error, "imperial").message).toBe("Box temperature: use at most 160 °F.");
  });

  it("names a nested field with its group and its place in the list", () => {
    const result = whatIfInputSchema.safeParse({
      origin: { zip: "97401" },
      destination: { zip: "37902" },
      departAt: "2026-12-05T08:00:00-05:00",
      mode: "overnight_air",
      profile: "temperate_snake",
      box: {
        wall: "eps",
        wallThicknessMm: 0,
        lengthMm: 300,
        widthMm: 200,
        heightMm: 200,
        contentsG: 500,
        pack: "none",
      },
    });
    expect(describeIssues((result as { error: z.ZodError }).error, "imperial").message).toBe(
      "Box wall thickness: use more than 0 in.",
    );
    expect(fieldName(["containers", 1, "wallThicknessMm"])).toBe("Box 2 wall thickness");
    expect(fieldName(["animals", 0, "weightG"])).toBe("Animal line 1 weight");
    expect(fieldName(["origin", "zip"])).toBe("Origin ZIP code");
    expect(fieldName(["address", "zip"])).toBe("ZIP code");
  });

  it("reads the quantity from the unit in the field's name", () => {
    expect(quantityAt(["containers", 0, "wallThicknessMm"])).toBe("length");
    expect(quantityAt(["safeTransitF", "max"])).toBe("temperature");
    expect(quantityAt(["items", 2, "weightG"])).toBe("weight");
    expect(quantityAt(["count"])).toBeNull();
  });
});

describe("the sentences", () => {
  it("put the field first and end with a full stop", () => {
    expect(sentence(["expectedArrivalAt"], "make it later than the planned departure")).toBe(
      "Planned arrival: make it later than the planned departure.",
    );
    expect(sentence([], "send the details as a group of fields")).toBe("Send the details as a group of fields.");
  });

  it("tell a missing value from a wrong one", () => {
    expect(issueSentence({ code: "invalid_type", expected: "string", input: undefined, path: ["name"] })).toBe(
      "Name: fill this in.",
    );
    expect(issueSentence({ code: "invalid_type", expected: "number", input: "three", path: ["count"] })).toBe(
      "Number of animals: enter a number.",
    );
    expect(issueSentence({ code: "invalid_type", expected: "int", input: 1.5, path: ["count"] })).toBe(
      "Number of animals: use a whole number.",
    );
  });
});
