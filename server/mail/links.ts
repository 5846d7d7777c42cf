/**
 * Where links in e-mail and on paper (the manifest's QR code) point. The composition root builds
 * one from PUBLIC_URL per app, so two apps in one process never hand out each other's address.
 */
export type AppLinks = {
  /** The public origin and path prefix, without a trailing slash. */
  readonly base: string;
  /** An absolute link to a path of the app (`/transfers/…`). */
  to(path: string): string;
};

export function createLinks(publicUrl: string): AppLinks {
  const base = publicUrl.replace(/\/+$/, "");
  return Object.freeze({ base, to: (path: string) => `${base}${path.startsWith("/") ? path : `/${path}`}` });
}
