import { useCallback, useState } from "react";
import { v4 as uuidv4 } from "uuid";
import { ApiError } from "./api-client";

/**
 * A fresh Idempotency-Key. crypto.randomUUID exists only in secure contexts; a phone opening
 * the dev server over plain http on the LAN gets the same kind of v4 UUID from `uuid`.
 */
export function newIdempotencyKey(): string {
  return typeof crypto !== "undefined" && typeof crypto.randomUUID === "function" ? crypto.randomUUID() : uuidv4();
}

/**
 * One key per submission, reused when the same submission is retried. The key is kept after a
 * network failure or a 5xx (the server may have recorded it) and renewed after a definite answer.
 */
export function useIdempotencyKey(): { key: string; settle: (error?: unknown) => void } {
  const [key, setKey] = useState(newIdempotencyKey);
  const settle = useCallback((error?: unknown) => {
    const maybeRecorded = error instanceof ApiError && (error.status === 0 || error.status >= 500);
    if (!maybeRecorded) setKey(newIdempotencyKey());
  }, []);
  return { key, settle };
}
