import { describe, expect, it } from "vitest";
import { excerpt, EXCERPT_MAX, isWellFormedText } from "./text";

describe("excerpt", () => {
  it("keeps short text as it is", () => {
    expect(excerpt("latin1")).toBe("latin1");
  });
  it("cuts long text to the limit, with an ellipsis, by characters not code units", () => {
    const long = "🐢".repeat(100);
    const cut = excerpt(long);
    expect([...cut]).toHaveLength(EXCERPT_MAX);
    expect(cut.endsWith("…")).toBe(true);
  });
  it("shows control characters, a byte-order mark and broken characters without passing them on", () => {
    // U+FFFD is Unicode's replacement character for an ill-formed sequence (Unicode 15, §3.9) [published].
    expect(excerpt("a\u0000b\nc\ufeffd\ud800")).toBe("a·b·c·d\ufffd");
  });
});

describe("isWellFormedText", () => {
  // Unicode 15, §3.9 D91: a well-formed UTF-16 string pairs every high surrogate with a low one [published].
  it("accepts paired surrogates and refuses a lone half in any position", () => {
    expect(isWellFormedText("turtle 🐢")).toBe(true);
    expect(isWellFormedText("\ud83d\udc22")).toBe(true);
    expect(isWellFormedText("\ud800")).toBe(false);
    expect(isWellFormedText("a\udc00b")).toBe(false);
    expect(isWellFormedText("\udc22\ud83d")).toBe(false);
  });
});
