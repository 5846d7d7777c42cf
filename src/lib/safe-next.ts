/**
 * Where to go after signing in: only a path on this site, never another origin
 * (OWASP Unvalidated Redirects cheat sheet). Anything else goes home.
 */
export function safeNext(next: string | null, fallback = "/"): string {
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return fallback;
  try {
    const url = new URL(next, "http://hatchway.invalid");
    return url.origin === "http://hatchway.invalid" ? `${url.pathname}${url.search}${url.hash}` : fallback;
  } catch {
    return fallback;
  }
}
