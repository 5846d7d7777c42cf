import type { HandoffInput, PhotoUploadQuery, TransferDto } from "@shared/schemas/transfer";
import { ApiError } from "@/lib/api-client";
import { listQueuedHandoffs, putQueuedHandoff, removeQueuedHandoff, type QueuedHandoff } from "@/lib/offline-handoffs";

/** How the kept handoffs reach the server: the page's own API calls (tests give their own). */
export type HandoffTransport = {
  recordHandoff: (transferId: string, input: HandoffInput, idempotencyKey: string) => Promise<TransferDto>;
  uploadPhoto: (transferId: string, query: PhotoUploadQuery, file: Blob) => Promise<TransferDto>;
};

export type SendReport = {
  /** Handoffs the server now has (photos included, or refused photos said in `photoProblems`). */
  sent: { entry: QueuedHandoff; transfer: TransferDto | null }[];
  /** Handoffs the server refused: kept, with its words, for the courier to read and resolve. */
  refused: QueuedHandoff[];
  photoProblems: string[];
  /** Something stopped the round (no network, the server down, signed out): the rest waits. */
  waiting: boolean;
};

/**
 * A refusal is final only when the server answered and said no (4xx). No answer, a 5xx, a
 * duplicate still running (409 `in_progress`), a lost session (401) or an old security token
 * may all go through later: try again with the same key.
 */
export function isFinalRefusal(error: unknown): error is ApiError {
  if (!(error instanceof ApiError)) return false;
  if (error.status === 0 || error.status >= 500) return false;
  if (error.status === 401 || error.code === "csrf" || error.code === "in_progress") return false;
  return error.status >= 400;
}

/** One at a time across the phone's tabs (Web Locks), so two pages never send the same handoff at once. */
async function exclusively<T>(run: () => Promise<T>): Promise<T | null> {
  const locks = typeof navigator !== "undefined" ? navigator.locks : undefined;
  if (!locks) return run();
  return locks.request("hatchway-offline-handoffs", { ifAvailable: true }, (lock) => (lock ? run() : null));
}

/**
 * Sends the person's kept handoffs, oldest first, each with the key it was confirmed with, then
 * its photos one by one. Returns null when another tab is already sending them.
 */
export function sendQueuedHandoffs(userId: string, transport: HandoffTransport): Promise<SendReport | null> {
  return exclusively(async () => {
    const report: SendReport = { sent: [], refused: [], photoProblems: [], waiting: false };
    for (const entry of await listQueuedHandoffs(userId)) {
      if (entry.state === "refused") continue;
      const outcome = await sendOne(entry, transport, report);
      if (outcome === "stop") {
        report.waiting = true;
        break;
      }
    }
    return report;
  });
}

async function sendOne(
  entry: QueuedHandoff,
  transport: HandoffTransport,
  report: SendReport,
): Promise<"done" | "refused" | "stop"> {
  let transfer: TransferDto | null = null;
  if (!entry.recorded) {
    try {
      transfer = await transport.recordHandoff(entry.transferId, entry.input, entry.idempotencyKey);
      entry = { ...entry, recorded: true, attempts: entry.attempts + 1 };
      await putQueuedHandoff(entry);
    } catch (error) {
      if (isFinalRefusal(error)) {
        const refused: QueuedHandoff = {
          ...entry,
          state: "refused",
          attempts: entry.attempts + 1,
          refusal: { status: error.status, code: error.code, message: error.message },
        };
        await putQueuedHandoff(refused);
        report.refused.push(refused);
        return "refused";
      }
      await putQueuedHandoff({ ...entry, attempts: entry.attempts + 1 });
      return "stop";
    }
  }
  const photos = [...entry.photos];
  while (photos.length) {
    const photo = photos[0]!;
    try {
      transfer = await transport.uploadPhoto(
        entry.transferId,
        {
          moment: "handoff",
          handoffIndex: entry.input.handoffIndex,
          subject: photo.subject,
          containerId: photo.containerId,
          animalId: photo.animalId,
        },
        photo.blob,
      );
    } catch (error) {
      if (!isFinalRefusal(error)) {
        await putQueuedHandoff({ ...entry, photos });
        return "stop";
      }
      report.photoProblems.push(`A photo was not accepted (${error.message}).`);
    }
    photos.shift();
    await putQueuedHandoff({ ...entry, photos });
  }
  await removeQueuedHandoff(entry.idempotencyKey);
  report.sent.push({ entry, transfer });
  return "done";
}
