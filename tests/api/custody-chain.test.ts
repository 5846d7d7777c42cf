/**
 * The chain cannot lose its end unnoticed (D19). Entries are removed and changed the way only a
 * superuser can — with every trigger switched off (`session_replication_role = replica`, the
 * PostgreSQL 15 manual, "20.11 Client Connection Defaults" [published]) — and the custody log
 * says where it breaks. Hashes are SHA-256 (FIPS 180-4 [published]); the export is checked by the
 * standalone recipe, scripts/verify-custody-export.mjs, as a party would check it.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { buildTransfer, buildUser } from "../factories";
import { createTestApp, signIn, withDatabaseAs, type Client, type TestApp } from "../support/app";
import { PROJECT_ROOT } from "../../scripts/lib/postgres";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** A transfer on the road (a log of several entries) and its sender, signed in. */
async function transferOnTheRoad(): Promise<{ id: string; sender: Client; seqs: number }> {
  const cast = await buildTransfer(t.orm.em.fork(), { status: "in_transit" });
  const sender = await signIn(t.app, cast.sender.email);
  const log = (await sender.get(`/api/transfers/${cast.transfer.id}/custody`)).body;
  expect(log.intact).toBe(true);
  expect(log.entries.length).toBeGreaterThanOrEqual(5);
  expect(log.head).toEqual({ seq: log.entries.at(-1).seq, hash: log.entries.at(-1).hash });
  return { id: cast.transfer.id, sender, seqs: log.entries.length };
}

/** As the superuser, with every trigger off for this session only. */
function behindTheTriggers(sql: string, values: unknown[]) {
  return withDatabaseAs("admin", async (client) => {
    await client.query("SET session_replication_role = replica");
    await client.query(sql, values);
  });
}

describe("verification against the chain's head", () => {
  it("a missing tail is reported where the log was cut, though what is left still chains", async () => {
    const { id, sender, seqs } = await transferOnTheRoad();
    await behindTheTriggers("DELETE FROM custody_entry WHERE transfer_id = $1 AND seq >= $2", [id, seqs - 1]);
    const log = (await sender.get(`/api/transfers/${id}/custody`)).body;
    expect(log.entries).toHaveLength(seqs - 2);
    expect(log).toMatchObject({
      intact: false,
      brokenAt: seqs - 1,
      breaks: [{ seq: seqs - 1, toSeq: seqs, problem: "missing_tail" }],
      head: { seq: seqs },
    });
    expect(log.reason).toBe(
      `Entries ${seqs - 1} to ${seqs} at the end of the log are missing: the log's recorded end is entry ${seqs}.`,
    );
  });

  it("a missing entry in the middle is reported at its place", async () => {
    const { id, sender } = await transferOnTheRoad();
    await behindTheTriggers("DELETE FROM custody_entry WHERE transfer_id = $1 AND seq = 3", [id]);
    const log = (await sender.get(`/api/transfers/${id}/custody`)).body;
    expect(log).toMatchObject({ intact: false, brokenAt: 3, breaks: [{ seq: 3, problem: "missing" }] });
  });

  it("a changed entry is reported at its place", async () => {
    const { id, sender } = await transferOnTheRoad();
    await behindTheTriggers("UPDATE custody_entry SET actor_name = 'Someone Else' WHERE transfer_id = $1 AND seq = 2", [
      id,
    ]);
    const log = (await sender.get(`/api/transfers/${id}/custody`)).body;
    expect(log).toMatchObject({ intact: false, brokenAt: 2, breaks: [{ seq: 2, problem: "changed" }] });
  });

  it("an entry added with the safeguards off lies past the head", async () => {
    const { id, sender, seqs } = await transferOnTheRoad();
    await behindTheTriggers(
      `INSERT INTO custody_entry (id, transfer_id, seq, kind, actor_id, actor_name, at, payload, prev_hash, hash)
       SELECT gen_random_uuid(), transfer_id, seq + 1, kind, actor_id, actor_name, at, payload, hash, hash
         FROM custody_entry WHERE transfer_id = $1 AND seq = $2`,
      [id, seqs],
    );
    const log = (await sender.get(`/api/transfers/${id}/custody`)).body;
    expect(log.breaks.map((b: { problem: string; seq: number }) => [b.problem, b.seq])).toContainEqual([
      "beyond_head",
      seqs + 1,
    ]);
  });

  it("after a cut, the log keeps growing from its recorded end, and the gap stays in view", async () => {
    const cast = await buildTransfer(t.orm.em.fork(), { status: "awaiting_receiver" });
    const receiver = await signIn(t.app, cast.receiver.email);
    const before = (await receiver.get(`/api/transfers/${cast.transfer.id}/custody`)).body;
    const last = before.entries.at(-1).seq as number;
    await behindTheTriggers("DELETE FROM custody_entry WHERE transfer_id = $1 AND seq = $2", [cast.transfer.id, last]);
    const sentBack = await receiver.post(`/api/transfers/${cast.transfer.id}/transition`, {
      to: "draft",
      reason: "Please add the CVI first.",
    });
    expect(sentBack.status).toBe(200);
    const after = (await receiver.get(`/api/transfers/${cast.transfer.id}/custody`)).body;
    expect(after.entries.at(-1).seq).toBe(last + 1);
    expect(after).toMatchObject({ intact: false, brokenAt: last, breaks: [{ seq: last, problem: "missing" }] });
  });
});

describe("the head in the database", () => {
  it("the app may read it but not move it, and an entry that does not continue the chain is refused", async () => {
    const { id } = await transferOnTheRoad();
    await expect(t.ctx.pool.query("UPDATE custody_head SET seq = 1 WHERE transfer_id = $1", [id])).rejects.toThrow(
      /permission denied/,
    );
    await expect(t.ctx.pool.query("DELETE FROM custody_head WHERE transfer_id = $1", [id])).rejects.toThrow(
      /permission denied/,
    );
    const { rows } = await t.ctx.pool.query("SELECT seq, hash FROM custody_head WHERE transfer_id = $1", [id]);
    expect(rows).toHaveLength(1);
    const skip = `INSERT INTO custody_entry (id, transfer_id, seq, kind, actor_id, actor_name, at, payload, prev_hash, hash)
                  VALUES (gen_random_uuid(), $1, $2, 'correction', NULL, 'x', now(), '{}', $3, $3)`;
    await expect(t.ctx.pool.query(skip, [id, rows[0].seq + 2, rows[0].hash])).rejects.toThrow(
      /does not continue the chain/,
    );
    await expect(t.ctx.pool.query(skip, [id, rows[0].seq + 1, "f".repeat(64)])).rejects.toThrow(
      /does not continue the chain/,
    );
  });
});

describe("the custody export", () => {
  const dir = mkdtempSync(path.join(tmpdir(), "hatchway-custody-"));
  const recipe = (...files: string[]) =>
    spawnSync(process.execPath, [path.join(PROJECT_ROOT, "scripts/verify-custody-export.mjs"), ...files], {
      encoding: "utf8",
    });
  const save = (name: string, body: unknown) => {
    const file = path.join(dir, name);
    writeFileSync(file, typeof body === "string" ? body : JSON.stringify(body));
    return file;
  };

  it("holds every entry with its hash and the head, and the standalone recipe checks it", async () => {
    const { id, sender, seqs } = await transferOnTheRoad();
    const res = await sender.get(`/api/transfers/${id}/custody/export`);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toMatch(/^application\/json/);
    expect(res.headers["content-disposition"]).toMatch(/^attachment; filename="?HW-[0-9A-Z-]+-custody\.json"?$/);
    const exported = JSON.parse(res.text);
    expect(exported).toMatchObject({
      format: "hatchway-custody-export/1",
      transfer: { id },
      chain: { algorithm: "SHA-256", genesisHash: "0".repeat(64) },
      head: { seq: seqs },
      check: { intact: true, breaks: [] },
    });
    expect(exported.entries).toHaveLength(seqs);
    expect(Object.keys(exported.entries[0]).sort()).toEqual(
      ["actorId", "actorName", "at", "hash", "kind", "payload", "prevHash", "seq", "transferId"].sort(),
    );

    const good = recipe(save("good.json", res.text));
    expect(good.stdout).toMatch(/^Intact/);
    expect(good.status).toBe(0);

    // An entry changed in the kept file: the recipe names it.
    const edited = structuredClone(exported);
    edited.entries[1].actorName = "Someone Else";
    const changed = recipe(save("edited.json", edited));
    expect(changed.status).toBe(1);
    expect(changed.stdout).toContain("- Entry 2 was changed after it was written.");

    // The last entry dropped from the file, the head kept: the end is missing.
    const cut = { ...exported, entries: exported.entries.slice(0, -1) };
    const short = recipe(save("cut.json", cut));
    expect(short.status).toBe(1);
    expect(short.stdout).toContain(`- Entry ${seqs} is missing at the end of the log.`);

    // The log and its head cut back together: it chains, but no longer continues the earlier export.
    const rewound = {
      ...exported,
      entries: exported.entries.slice(0, 3),
      head: { seq: 3, hash: exported.entries[2].hash },
    };
    expect(recipe(save("rewound.json", rewound)).status).toBe(0);
    const continued = recipe(save("rewound-again.json", rewound), save("earlier.json", exported));
    expect(continued.status).toBe(1);
    expect(continued.stdout).toContain(`- Entry ${seqs}, the end of the earlier export, is no longer in the log.`);
  });

  it("a later export continues an earlier one", async () => {
    const cast = await buildTransfer(t.orm.em.fork(), { status: "awaiting_receiver" });
    const receiver = await signIn(t.app, cast.receiver.email);
    const earlier = (await receiver.get(`/api/transfers/${cast.transfer.id}/custody/export`)).text;
    await receiver.post(`/api/transfers/${cast.transfer.id}/transition`, { to: "draft", reason: "Needs a CVI." });
    const later = (await receiver.get(`/api/transfers/${cast.transfer.id}/custody/export`)).text;
    const result = recipe(save("later.json", later), save("earlier-ok.json", earlier));
    expect(result.stdout).toMatch(/^Intact/);
    expect(result.status).toBe(0);
  });

  it("is refused, like the log, to anyone who is not part of the transfer", async () => {
    const { id } = await transferOnTheRoad();
    const stranger = await signIn(t.app, (await buildUser(t.orm.em.fork())).email);
    expect((await stranger.get(`/api/transfers/${id}/custody/export`)).status).toBe(404);
  });
});
