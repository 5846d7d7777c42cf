/**
 * The phone's queue of handoffs confirmed without signal (DEVELOPERS.md D40), on fake-indexeddb:
 * every try sends the same key and body, a lost answer never doubles the record, a refusal is
 * kept with the server's words, photos follow the handoff, and one person never sees another's.
 * [practice] the IETF httpapi Idempotency-Key draft: a retry repeats the key and the body.
 */
import "fake-indexeddb/auto";
import { beforeEach, describe, expect, it } from "vitest";
import type { HandoffInput, PhotoUploadQuery, TransferDto } from "@shared/schemas/transfer";
import { ApiError } from "@/lib/api-client";
import {
  forgetQueuedHandoffs,
  listQueuedHandoffs,
  queueHandoff,
  type QueuedHandoff,
  type QueuedPhoto,
} from "@/lib/offline-handoffs";
import { isUnreachable } from "./record-handoff";
import { isFinalRefusal, sendQueuedHandoffs, type HandoffTransport } from "./send-queued-handoffs";

const input = (handoffIndex: number): HandoffInput => ({
  handoffIndex,
  boxesCounted: 1,
  seals: [],
  boxTempF: null,
  place: { text: "Rest area, mile 112", lat: null, lon: null, accuracyM: null },
  releasedByName: "Ada Sender",
  receivedByName: "Juno Park",
  notes: "",
  reasons: {},
  receiverCode: null,
  acknowledged: true,
});

const photo = (key: string): QueuedPhoto => ({
  key,
  blob: new Blob([`photo ${key}`], { type: "image/jpeg" }),
  subject: "box_outside",
});

let counter = 0;
function keep(overrides: Partial<Omit<QueuedHandoff, "state" | "recorded" | "refusal" | "attempts">> = {}) {
  counter += 1;
  return queueHandoff({
    idempotencyKey: `key-${counter}`,
    userId: "courier-1",
    transferId: "transfer-1",
    transferNumber: "HW-26-TEST1",
    kind: "pickup",
    input: input(0),
    photos: [],
    createdAt: new Date(Date.UTC(2026, 11, 2, 10, counter)).toISOString(),
    ...overrides,
  });
}

const transfer = { id: "transfer-1" } as TransferDto;
const noSignal = () => new ApiError(0, "network", "Hatchway cannot be reached.");

/**
 * A server that behaves as server/http/idempotency.ts does: one record per (key, body), a repeat
 * replays; `script` says, call by call, what happens to each request on its way.
 */
function fakeServer(script: ("lost-before" | "lost-after" | "ok" | "500" | { refuse: number; message: string })[]) {
  const records = new Map<string, string>();
  const calls: { key: string; body: string }[] = [];
  const photos: { transferId: string; query: PhotoUploadQuery; file: Blob }[] = [];
  let photoScript: ("ok" | "lost" | "refuse")[] = [];
  const transport: HandoffTransport = {
    async recordHandoff(_transferId, body, key) {
      const serialized = JSON.stringify(body);
      calls.push({ key, body: serialized });
      const step = script.shift() ?? "ok";
      if (step === "lost-before") throw noSignal();
      if (step === "500") throw new ApiError(500, "internal", "Something went wrong on our side.");
      if (typeof step === "object") throw new ApiError(step.refuse, "refused", step.message);
      const prior = records.get(key);
      if (prior !== undefined && prior !== serialized) throw new ApiError(422, "idempotency_key_reused", "reused");
      records.set(key, serialized);
      if (step === "lost-after") throw noSignal();
      return transfer;
    },
    async uploadPhoto(transferId, query, file) {
      const step = photoScript.shift() ?? "ok";
      if (step === "lost") throw noSignal();
      if (step === "refuse") throw new ApiError(415, "unsupported_type", "This file is not a photo we accept.");
      photos.push({ transferId, query, file });
      return transfer;
    },
  };
  return {
    transport,
    records,
    calls,
    photos,
    setPhotoScript: (next: typeof photoScript) => (photoScript = next),
  };
}

beforeEach(async () => {
  await forgetQueuedHandoffs(null);
});

describe("a handoff kept on the phone", () => {
  it("is sent with the same key and body on every try, and recorded once although an answer was lost", async () => {
    const server = fakeServer(["lost-before", "lost-after", "ok"]);
    const kept = await keep();

    const first = await sendQueuedHandoffs("courier-1", server.transport);
    expect(first).toMatchObject({ waiting: true, sent: [], refused: [] });
    // The server recorded it, but the phone never heard back: it stays on the phone.
    const second = await sendQueuedHandoffs("courier-1", server.transport);
    expect(second?.waiting).toBe(true);
    expect(await listQueuedHandoffs("courier-1")).toHaveLength(1);

    const third = await sendQueuedHandoffs("courier-1", server.transport);
    expect(third?.sent.map((s) => s.entry.idempotencyKey)).toEqual([kept.idempotencyKey]);
    expect(new Set(server.calls.map((c) => c.key))).toEqual(new Set([kept.idempotencyKey]));
    expect(new Set(server.calls.map((c) => c.body)).size).toBe(1);
    expect(server.records.size).toBe(1);
    expect(await listQueuedHandoffs("courier-1")).toEqual([]);
  });

  it("keeps a refusal with the server's words and does not send it again by itself", async () => {
    const server = fakeServer([
      { refuse: 404, message: "This leg is no longer yours: it was given to another courier." },
    ]);
    await keep();
    const report = await sendQueuedHandoffs("courier-1", server.transport);
    expect(report?.refused).toHaveLength(1);
    const [kept] = await listQueuedHandoffs("courier-1");
    expect(kept).toMatchObject({
      state: "refused",
      recorded: false,
      refusal: { status: 404, message: "This leg is no longer yours: it was given to another courier." },
    });
    await sendQueuedHandoffs("courier-1", server.transport);
    expect(server.calls).toHaveLength(1);
  });

  it("keeps it waiting after a server error and tries again later", async () => {
    const server = fakeServer(["500", "ok"]);
    await keep();
    expect((await sendQueuedHandoffs("courier-1", server.transport))?.waiting).toBe(true);
    expect((await listQueuedHandoffs("courier-1"))[0]).toMatchObject({ state: "waiting", attempts: 1 });
    expect((await sendQueuedHandoffs("courier-1", server.transport))?.sent).toHaveLength(1);
    expect(server.records.size).toBe(1);
  });

  it("sends its photos after the handoff, and a photo that did not go is sent later without the handoff again", async () => {
    const server = fakeServer(["ok"]);
    server.setPhotoScript(["ok", "lost"]);
    await keep({ input: input(1), kind: "handoff", photos: [photo("a"), photo("b")] });

    expect((await sendQueuedHandoffs("courier-1", server.transport))?.waiting).toBe(true);
    const [left] = await listQueuedHandoffs("courier-1");
    expect(left).toMatchObject({ recorded: true });
    expect(left!.photos.map((p) => p.key)).toEqual(["b"]);

    const report = await sendQueuedHandoffs("courier-1", server.transport);
    expect(report?.sent).toHaveLength(1);
    expect(server.calls).toHaveLength(1);
    expect(server.photos.map((p) => p.query)).toEqual([
      { moment: "handoff", handoffIndex: 1, subject: "box_outside", containerId: undefined, animalId: undefined },
      { moment: "handoff", handoffIndex: 1, subject: "box_outside", containerId: undefined, animalId: undefined },
    ]);
    // (jsdom's Blob does not survive fake-indexeddb's cloning; the browser test sends a real photo.)
    expect(await listQueuedHandoffs("courier-1")).toEqual([]);
  });

  it("says which photo the server refused and does not hold the handoff for it", async () => {
    const server = fakeServer(["ok"]);
    server.setPhotoScript(["refuse"]);
    await keep({ photos: [photo("a")] });
    const report = await sendQueuedHandoffs("courier-1", server.transport);
    expect(report?.sent).toHaveLength(1);
    expect(report?.photoProblems).toEqual(["A photo was not accepted (This file is not a photo we accept.)."]);
    expect(await listQueuedHandoffs("courier-1")).toEqual([]);
  });

  it("sends the oldest first and stops the round when the signal goes", async () => {
    const server = fakeServer(["ok", "lost-before"]);
    const older = await keep({ input: input(0) });
    await keep({ input: input(1), kind: "handoff" });
    const report = await sendQueuedHandoffs("courier-1", server.transport);
    expect(report?.sent.map((s) => s.entry.idempotencyKey)).toEqual([older.idempotencyKey]);
    expect(report?.waiting).toBe(true);
    expect((await listQueuedHandoffs("courier-1")).map((e) => e.input.handoffIndex)).toEqual([1]);
  });

  it("is one person's: another's are neither listed nor sent, and go when the phone changes hands", async () => {
    const server = fakeServer([]);
    await keep({ userId: "courier-2" });
    await keep();
    expect((await listQueuedHandoffs("courier-1")).map((e) => e.userId)).toEqual(["courier-1"]);
    await sendQueuedHandoffs("courier-1", server.transport);
    expect(server.calls).toHaveLength(1);

    await keep({ userId: "courier-2" });
    await forgetQueuedHandoffs("courier-2");
    expect(await listQueuedHandoffs("courier-2")).toHaveLength(2);
    await forgetQueuedHandoffs(null);
    expect(await listQueuedHandoffs("courier-2")).toEqual([]);
  });
});

describe("which answers end the wait", () => {
  it("treats no answer, 5xx, a lost session and a duplicate in flight as 'try later', other 4xx as final", () => {
    expect(isFinalRefusal(noSignal())).toBe(false);
    expect(isFinalRefusal(new ApiError(503, "unavailable", "down"))).toBe(false);
    expect(isFinalRefusal(new ApiError(401, "unauthenticated", "sign in"))).toBe(false);
    expect(isFinalRefusal(new ApiError(409, "in_progress", "still running"))).toBe(false);
    expect(isFinalRefusal(new ApiError(403, "csrf", "token"))).toBe(false);
    expect(isFinalRefusal(new ApiError(409, "conflict", "already recorded"))).toBe(true);
    expect(isFinalRefusal(new ApiError(404, "not_found", "not yours"))).toBe(true);
    expect(isFinalRefusal(new TypeError("Failed to fetch"))).toBe(false);
  });

  it("keeps a handoff on the phone only when the server was not reached", () => {
    expect(isUnreachable(new TypeError("Failed to fetch"))).toBe(true);
    expect(isUnreachable(noSignal())).toBe(true);
    expect(isUnreachable(new ApiError(504, "gateway", "timeout"))).toBe(true);
    expect(isUnreachable(new ApiError(400, "validation", "bad"))).toBe(false);
    expect(isUnreachable(new ApiError(500, "internal", "bug"))).toBe(false);
  });
});
