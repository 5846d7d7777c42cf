import { describe, expect, it } from "vitest";
import {
  canonicalJson,
  GENESIS_HASH,
  seal,
  sha256Hex,
  verifyChain,
  type ChainEntry,
  type SealedEntry,
} from "./hash-chain";

describe("sha256Hex", () => {
  it('matches the FIPS 180-2 example for "abc" [published]', () => {
    expect(sha256Hex("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  });
  it("matches the FIPS 180-2 empty-message digest [published]", () => {
    expect(sha256Hex("")).toBe("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
  });
});

describe("canonicalJson", () => {
  it("orders keys and prints values as RFC 8785 JCS does (its §3.2.3 example) [memory]", () => {
    const input = JSON.parse(
      '{"numbers":[333333333.33333329,1E30,4.50,2e-3,0.000000000000000000000000001],"string":"\\u20ac$\\u000F\\u000aA\'\\u0042\\u0022\\u005c\\\\\\"\\/","literals":[null,true,false]}',
    );
    expect(canonicalJson(input)).toBe(
      '{"literals":[null,true,false],"numbers":[333333333.3333333,1e+30,4.5,0.002,1e-27],"string":"€$\\u000f\\nA\'B\\"\\\\\\\\\\"/"}',
    );
  });
  it("is independent of key insertion order and drops undefined", () => {
    expect(canonicalJson({ b: 1, a: { d: [1, 2], c: undefined } })).toBe(canonicalJson({ a: { d: [1, 2] }, b: 1 }));
  });
});

function chain(n: number): SealedEntry[] {
  const out: SealedEntry[] = [];
  let prev = GENESIS_HASH;
  for (let seq = 1; seq <= n; seq++) {
    const entry: ChainEntry = {
      transferId: "t-1",
      seq,
      kind: "handoff",
      actorId: "u-1",
      actorName: "Juno Park",
      at: new Date(Date.UTC(2027, 2, 9, 12, seq)).toISOString(),
      payload: { boxesCounted: seq },
    };
    const sealed = seal(prev, entry);
    out.push(sealed);
    prev = sealed.hash;
  }
  return out;
}

const headOf = (c: readonly SealedEntry[]) => ({ seq: c.at(-1)!.seq, hash: c.at(-1)!.hash });

// 21 CFR 11.10(e): record changes shall not obscure previously recorded information; a hash
// chain makes any such change detectable [published, used as a model].
describe("verifyChain", () => {
  it("an untouched chain that ends at its head is intact", () => {
    const c = chain(10);
    expect(verifyChain(c, headOf(c))).toEqual({ intact: true, brokenAt: null, reason: null, breaks: [] });
    expect(verifyChain([], null)).toMatchObject({ intact: true });
  });
  it("an edited payload breaks the chain at that entry", () => {
    const c = chain(5);
    const head = headOf(c);
    c[2] = { ...c[2]!, payload: { boxesCounted: 99 } };
    expect(verifyChain(c, head)).toMatchObject({
      intact: false,
      brokenAt: 3,
      reason: "Entry 3 was changed after it was written.",
      breaks: [{ seq: 3, toSeq: 3, problem: "changed" }],
    });
  });
  it("an edited time or actor breaks it too", () => {
    const c = chain(3);
    const head = headOf(c);
    c[1] = { ...c[1]!, actorName: "Someone Else" };
    expect(verifyChain(c, head).brokenAt).toBe(2);
  });
  it("a removed entry in the middle is found where it was", () => {
    const c = chain(4);
    const head = headOf(c);
    c.splice(1, 1);
    expect(verifyChain(c, head)).toMatchObject({
      intact: false,
      brokenAt: 2,
      breaks: [{ seq: 2, toSeq: 2, problem: "missing", message: "Entry 2 is missing from the log." }],
    });
  });
  it("a re-sealed edit still breaks the link from the next entry", () => {
    const c = chain(4);
    const head = headOf(c);
    const { prevHash, hash: _h, ...body } = c[1]!;
    c[1] = seal(prevHash, { ...body, payload: { boxesCounted: 0 } });
    expect(verifyChain(c, head)).toMatchObject({ intact: false, brokenAt: 3, breaks: [{ problem: "unlinked" }] });
  });
  it("entries removed from the end are found against the head, though what is left is a valid chain", () => {
    const c = chain(6);
    const head = headOf(c);
    const cut = c.slice(0, 4);
    // Without the head the shortened log would pass: that is the gap the head closes.
    expect(verifyChain(cut, headOf(cut)).intact).toBe(true);
    expect(verifyChain(cut, head)).toMatchObject({
      intact: false,
      brokenAt: 5,
      breaks: [{ seq: 5, toSeq: 6, problem: "missing_tail" }],
    });
    expect(verifyChain(c.slice(0, 5), head).reason).toBe(
      "Entry 6 at the end of the log is missing: the log's recorded end is entry 6.",
    );
    expect(verifyChain([], head)).toMatchObject({ intact: false, brokenAt: 1 });
  });
  it("entries added past the head, and a replaced last entry, are found", () => {
    const c = chain(5);
    expect(verifyChain(c, headOf(c.slice(0, 3)))).toMatchObject({
      brokenAt: 4,
      breaks: [{ seq: 4, toSeq: 5, problem: "beyond_head" }],
    });
    const { prevHash, hash: _h, ...body } = c[4]!;
    const replaced = [...c.slice(0, 4), seal(prevHash, { ...body, payload: { boxesCounted: 0 } })];
    expect(verifyChain(replaced, headOf(c))).toMatchObject({ brokenAt: 5, breaks: [{ problem: "head_mismatch" }] });
  });
  it("a log with entries but no recorded head cannot be confirmed complete", () => {
    expect(verifyChain(chain(2), null)).toMatchObject({
      intact: false,
      brokenAt: 2,
      breaks: [{ problem: "head_missing" }],
    });
  });
  it("reports every break, in order, not only the first", () => {
    const c = chain(8);
    const head = headOf(c);
    c[1] = { ...c[1]!, kind: "correction" };
    const broken = [...c.slice(0, 4), ...c.slice(5, 6)];
    expect(verifyChain(broken, head).breaks.map((b) => [b.problem, b.seq, b.toSeq])).toEqual([
      ["changed", 2, 2],
      ["missing", 5, 5],
      ["missing_tail", 7, 8],
    ]);
  });
});
