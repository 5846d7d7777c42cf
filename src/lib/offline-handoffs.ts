/**
 * Handoffs confirmed without signal, kept on the phone (IndexedDB, through `idb`) until Hatchway
 * has them (DEVELOPERS.md D40). Each keeps the Idempotency-Key it was confirmed with: every try
 * sends the same key and the same body, so the server records it once however often it arrives.
 * Photos are kept as Blobs and sent after the handoff, as on the page.
 */
import { openDB, type DBSchema, type IDBPDatabase } from "idb";
import type { HandoffKind, OfflineHandoffState, PhotoSubject } from "@shared/constants";
import type { HandoffInput } from "@shared/schemas/transfer";

export type QueuedPhoto = {
  key: string;
  blob: Blob;
  subject: PhotoSubject;
  containerId?: string;
  animalId?: string;
};

export type QueuedHandoff = {
  /** The Idempotency-Key, which also names the entry. */
  idempotencyKey: string;
  userId: string;
  transferId: string;
  /** For the legs list and the leg page while the phone has no copy of the transfer. */
  transferNumber: string;
  kind: HandoffKind;
  input: HandoffInput;
  photos: QueuedPhoto[];
  /** When the courier confirmed it, by the phone's clock (the record takes the server's time on arrival). */
  createdAt: string;
  state: OfflineHandoffState;
  /** True once the server has the handoff; what is left to send are its photos. */
  recorded: boolean;
  /** The server's refusal, word for word, when it refused. */
  refusal: { status: number; code: string; message: string } | null;
  attempts: number;
};

interface QueueSchema extends DBSchema {
  handoffs: { key: string; value: QueuedHandoff; indexes: { byUser: string } };
}

const DB_NAME = "hatchway-offline";
const STORE = "handoffs";

/**
 * Opens the phone's queue. One connection per call: a page holds few, and closing it after use
 * lets another tab upgrade the database.
 */
async function withDb<T>(work: (db: IDBPDatabase<QueueSchema>) => Promise<T>): Promise<T> {
  const db = await openDB<QueueSchema>(DB_NAME, 1, {
    upgrade(database) {
      const store = database.createObjectStore(STORE, { keyPath: "idempotencyKey" });
      store.createIndex("byUser", "userId");
    },
  });
  try {
    return await work(db);
  } finally {
    db.close();
  }
}

/** Keeps a handoff that could not be sent; the same key again replaces it (nothing doubles). */
export function queueHandoff(
  entry: Omit<QueuedHandoff, "state" | "recorded" | "refusal" | "attempts">,
): Promise<QueuedHandoff> {
  const stored: QueuedHandoff = { ...entry, state: "waiting", recorded: false, refusal: null, attempts: 0 };
  return withDb(async (db) => {
    await db.put(STORE, stored);
    return stored;
  });
}

/** The person's kept handoffs, oldest first (the order they happened in). */
export function listQueuedHandoffs(userId: string): Promise<QueuedHandoff[]> {
  return withDb(async (db) => {
    const rows = await db.getAllFromIndex(STORE, "byUser", userId);
    return rows.sort((a, b) => a.createdAt.localeCompare(b.createdAt));
  });
}

export function putQueuedHandoff(entry: QueuedHandoff): Promise<void> {
  return withDb(async (db) => void (await db.put(STORE, entry)));
}

export function removeQueuedHandoff(idempotencyKey: string): Promise<void> {
  return withDb((db) => db.delete(STORE, idempotencyKey));
}

/**
 * Removes what the phone kept for anyone but `keepUserId` (null: for everyone): at sign-out and
 * when another person signs in, so nobody reads another's handoffs on a shared phone.
 */
export function forgetQueuedHandoffs(keepUserId: string | null): Promise<void> {
  return withDb(async (db) => {
    const tx = db.transaction(STORE, "readwrite");
    for (let cursor = await tx.store.openCursor(); cursor; cursor = await cursor.continue()) {
      if (cursor.value.userId !== keepUserId) await cursor.delete();
    }
    await tx.done;
  });
}
