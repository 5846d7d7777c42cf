/**
 * Work a person typed and has not saved yet, kept in this browser (localStorage) under their
 * user id: it survives a reload, Back, a closed tab or a crash, is never sent anywhere, is
 * forgotten after two weeks, and is removed when the person signs out.
 */
const PREFIX = "hatchway.kept.";
const FORMAT = 1;
const KEEP_MS = 14 * 24 * 3600_000;

// Forms use NaN for "a number not filled in yet", which JSON would turn into null.
const encode = (_key: string, value: unknown) =>
  typeof value === "number" && Number.isNaN(value) ? { $nan: true } : value;
const decode = (_key: string, value: unknown) =>
  value !== null && typeof value === "object" && (value as { $nan?: unknown }).$nan === true ? Number.NaN : value;

const keyOf = (what: string, userId: string) => `${PREFIX}${what}.${userId}`;

function store(): Storage | null {
  try {
    return window.localStorage;
  } catch {
    return null; // storage switched off (some private windows)
  }
}

export function readKeptWork<T>(what: string, userId: string, now = Date.now()): { keptAt: string; work: T } | null {
  const key = keyOf(what, userId);
  try {
    const text = store()?.getItem(key);
    if (!text) return null;
    const kept = JSON.parse(text, decode) as { format?: number; keptAt?: string; work?: T };
    const age = now - Date.parse(kept.keptAt ?? "");
    if (kept.format !== FORMAT || kept.work === undefined || !(age >= 0 && age < KEEP_MS)) {
      store()?.removeItem(key);
      return null;
    }
    return { keptAt: kept.keptAt!, work: kept.work };
  } catch {
    return null;
  }
}

/** True when the copy is kept; false when the browser refused (full, or storage switched off). */
export function keepWork<T>(what: string, userId: string, work: T, now = new Date()): boolean {
  try {
    const target = store();
    if (!target) return false;
    target.setItem(keyOf(what, userId), JSON.stringify({ format: FORMAT, keptAt: now.toISOString(), work }, encode));
    return true;
  } catch {
    return false;
  }
}

export function forgetWork(what: string, userId: string): void {
  try {
    store()?.removeItem(keyOf(what, userId));
  } catch {
    // nothing kept
  }
}

/** On sign-out: nobody else at this computer finds the person's unsaved work. */
export function forgetAllWork(): void {
  const target = store();
  if (!target) return;
  try {
    for (const key of Object.keys(target)) if (key.startsWith(PREFIX)) target.removeItem(key);
  } catch {
    // nothing kept
  }
}
