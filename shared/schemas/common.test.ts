import { describe, expect, it } from "vitest";
import { type z } from "zod";
import { describeIssues } from "../validation/messages";
import { addressSchema, emailKey, emailSchema, passwordSchema, requiredText } from "./common";
import { organizationInputSchema } from "./auth";

describe("emailKey", () => {
  it("matches case-insensitively after NFC normalisation (Unicode UAX #15)", () => {
    // U+00E9 (precomposed é) and U+0065 U+0301 (e + combining acute) are canonically equivalent.
    expect(emailKey("Ren\u00e9@Example.ORG")).toBe(emailKey("RENE\u0301@example.org"));
    expect(emailKey(" ann@example.org ")).toBe("ann@example.org");
    expect(emailKey("ann@example.org")).not.toBe(emailKey("anne@example.org"));
  });
});

describe("passwords (OWASP ASVS 5.0 V6.2: at least 8, 64+ allowed, no composition rules)", () => {
  it("takes 8 characters, refuses 7", () => {
    expect(passwordSchema.safeParse("12345678").success).toBe(true);
    expect(passwordSchema.safeParse("1234567").success).toBe(false);
  });
  it("allows 64 and more, spaces and any script, without truncation", () => {
    const long = "correct horse battery staple ".repeat(4);
    expect(long.length).toBeGreaterThanOrEqual(64);
    expect(passwordSchema.parse(long)).toBe(long);
    expect(passwordSchema.safeParse("пароль-пароль").success).toBe(true);
  });
});

describe("text fields", () => {
  it("trim, refuse NUL and cap the length", () => {
    const name = requiredText(5);
    expect(name.parse("  abc  ")).toBe("abc");
    expect(name.safeParse("a\u0000b").success).toBe(false);
    expect(name.safeParse("abcdef").success).toBe(false);
    expect(name.safeParse("   ").success).toBe(false);
  });
  it("e-mail must look like one", () => {
    expect(emailSchema.safeParse("keeper@example.org").success).toBe(true);
    expect(emailSchema.safeParse("keeper-at-example.org").success).toBe(false);
  });
});

describe("addresses", () => {
  const ok = { street: "1 Reed Way", city: "Boise", state: "ID", zip: "83702" };
  it("take USPS state codes and 5-digit or ZIP+4 codes (USPS Publication 28)", () => {
    expect(addressSchema.safeParse(ok).success).toBe(true);
    expect(addressSchema.safeParse({ ...ok, zip: "83702-1234" }).success).toBe(true);
    expect(addressSchema.safeParse({ ...ok, zip: "8370" }).success).toBe(false);
    expect(addressSchema.safeParse({ ...ok, state: "Idaho" }).success).toBe(false);
    expect(addressSchema.safeParse({ ...ok, country: "US" }).success).toBe(false);
  });
});

describe("describeIssues", () => {
  it("names the deepest field and the unknown key", () => {
    const bad = organizationInputSchema.safeParse({
      name: "X",
      kind: "zoo",
      address: { street: "s", city: "c", state: "OR", zip: 1 },
      phone: "+1 503 555 0100",
      email: "a@b.co",
    });
    expect(bad.success).toBe(false);
    expect(describeIssues((bad as { error: z.ZodError }).error)).toEqual({
      field: "address.zip",
      message: "ZIP code: enter a 5-digit ZIP code, such as 97401.",
    });
    const extra = organizationInputSchema.safeParse({
      name: "X",
      kind: "zoo",
      address: { street: "s", city: "c", state: "OR", zip: "97301" },
      phone: "+1 503 555 0100",
      email: "a@b.co",
      owner: "me",
    });
    expect(describeIssues((extra as { error: z.ZodError }).error)).toEqual({
      field: "owner",
      message: "Remove “owner”: it is not a field here.",
    });
  });
});
