/** A query string from the filled-in values only: "", null, undefined and non-scalars are left out. */
export function toQueryString(params: Record<string, unknown>): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if ((typeof value === "string" && value !== "") || typeof value === "number" || typeof value === "boolean")
      search.set(key, String(value));
  }
  return search.toString();
}
