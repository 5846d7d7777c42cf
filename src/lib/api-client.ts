/**
 * The one way the client talks to the API: same-origin JSON, the CSRF token on every
 * state-changing request, and errors turned into ApiError with the server's message.
 */
import { readUnitSystem } from "./units-preference";

export class ApiError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly field?: string,
    public readonly body?: Record<string, unknown>,
  ) {
    super(message);
  }
}

let csrfToken: string | null = null;

async function csrf(): Promise<string> {
  if (csrfToken) return csrfToken;
  let response: Response;
  try {
    response = await fetch("/api/auth/csrf", { credentials: "same-origin" });
  } catch {
    throw new ApiError(0, "network", "Hatchway cannot be reached. Check your connection and try again.");
  }
  if (!response.ok) throw new ApiError(response.status, "csrf", "Could not reach Hatchway. Check your connection.");
  csrfToken = ((await response.json()) as { csrfToken: string }).csrfToken;
  return csrfToken;
}

/** Forget the token, e.g. after signing out (the server session is gone). */
export function resetCsrf(): void {
  csrfToken = null;
}

type Options = {
  method?: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  body?: unknown;
  headers?: Record<string, string>;
  signal?: AbortSignal;
  /** Send `body` (a string) as-is with this type instead of as JSON (the register's CSV import). */
  contentType?: string;
};

export async function api<T>(path: string, options: Options = {}, retried = false): Promise<T> {
  const method = options.method ?? "GET";
  // The server words a measurement's limit in the units the person reads, like the form does.
  const headers: Record<string, string> = {
    Accept: "application/json",
    "Hatchway-Units": readUnitSystem(),
    ...options.headers,
  };
  if (method !== "GET") headers["X-CSRF-Token"] = await csrf();
  if (options.body !== undefined) headers["Content-Type"] = options.contentType ?? "application/json";
  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      credentials: "same-origin",
      body:
        options.body === undefined
          ? undefined
          : options.contentType && typeof options.body === "string"
            ? options.body
            : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch {
    throw new ApiError(0, "network", "Hatchway cannot be reached. Check your connection and try again.");
  }
  if (response.status === 204) return undefined as T;
  const body = (await response.json().catch(() => null)) as {
    error?: { code: string; message: string; field?: string };
  } | null;
  if (!response.ok) {
    const error = body?.error;
    if (response.status === 403 && error?.code === "csrf" && !retried) {
      resetCsrf();
      return api<T>(path, options, true);
    }
    throw new ApiError(
      response.status,
      error?.code ?? "error",
      error?.message ?? `The request failed (${response.status}).`,
      error?.field,
      body as Record<string, unknown>,
    );
  }
  return body as T;
}

/**
 * Sends a file itself as the body (photos): the CSRF token as for every write, the type declared
 * as octet-stream (the server reads the real type from the bytes), errors as ApiError.
 */
export async function apiFile<T>(path: string, file: Blob, retried = false): Promise<T> {
  let response: Response;
  try {
    response = await fetch(path, {
      method: "POST",
      credentials: "same-origin",
      headers: {
        Accept: "application/json",
        "Content-Type": "application/octet-stream",
        "X-CSRF-Token": await csrf(),
      },
      body: file,
    });
  } catch {
    throw new ApiError(0, "network", "Hatchway cannot be reached. Check your connection and try again.");
  }
  const body = (await response.json().catch(() => null)) as {
    error?: { code: string; message: string; field?: string };
  } | null;
  if (!response.ok) {
    if (response.status === 403 && body?.error?.code === "csrf" && !retried) {
      resetCsrf();
      return apiFile<T>(path, file, true);
    }
    throw new ApiError(
      response.status,
      body?.error?.code ?? "error",
      body?.error?.message ?? `The request failed (${response.status}).`,
      body?.error?.field,
      body as Record<string, unknown>,
    );
  }
  return body as T;
}
