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

// 21 CFR 11.10(e): record changes shall not obscure previously recorded information; a hash
// chain makes any such change detectable [published, used as a model].
describe("verifyChain", () => {
  it("an untouched chain is intact", () => {
    expect(verifyChain(chain(10))).toEqual({ intact: true, brokenAt: null, reason: null });
  });
  it("an edited payload breaks the chain at that entry", () => {
    const c = chain(5);
    c[2] = { ...c[2]!, payload: { boxesCounted: 99 } };
    expect(verifyChain(c)).toMatchObject({ intact: false, brokenAt: 3 });
  });
  it("an edited time or actor breaks it too", () => {
    const c = chain(3);
    c[1] = { ...c[1]!, actorName: "Someone Else" };
    expect(verifyChain(c).brokenAt).toBe(2);
  });
  it("a removed entry is found", () => {
    const c = chain(4);
    c.splice(1, 1);
    expect(verifyChain(c)).toMatchObject({ intact: false, brokenAt: 3 });
  });
  it("a re-sealed edit still breaks the link from the next entry", () => {
    const c = chain(4);
    const { prevHash, hash: _h, ...body } = c[1]!;
    c[1] = seal(prevHash, { ...body, payload: { boxesCounted: 0 } });
    expect(verifyChain(c)).toMatchObject({ intact: false, brokenAt: 3 });
  });
});
