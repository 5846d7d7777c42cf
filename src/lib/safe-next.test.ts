import { describe, expect, it } from "vitest";
import { safeNext } from "./safe-next";

// OWASP Unvalidated Redirects and Forwards cheat sheet: only allow local paths.
describe("safeNext", () => {
  it("keeps a local path with its query", () => {
    expect(safeNext("/transfers/abc?tab=custody")).toBe("/transfers/abc?tab=custody");
  });
  it.each(["https://evil.example/", "//evil.example/x", "/\\evil.example", "javascript:alert(1)", "", null])(
    "refuses %s",
    (next) => {
      expect(safeNext(next as string | null)).toBe("/");
    },
  );
});
