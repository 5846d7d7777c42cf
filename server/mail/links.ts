/** Where links in e-mail point: set once from PUBLIC_URL when the app is built. */
let publicUrl = "http://127.0.0.1:3000";

export function configureLinks(url: string): void {
  publicUrl = url.replace(/\/+$/, "");
}

export function appLink(path: string): string {
  return `${publicUrl}${path.startsWith("/") ? path : `/${path}`}`;
}
