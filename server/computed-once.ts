/**
 * A value computed on first use that is the same for every app in the process: font files read
 * from node_modules, the dummy password hash. The one sanctioned kind of module-level memory
 * (D16 in DEVELOPERS.md): it holds no setting and nothing an app chooses, so sharing it between
 * apps changes no behaviour, only the time of the first call.
 */
export function computedOnce<T>(compute: () => T): () => T {
  let computed: { value: T } | null = null;
  return () => (computed ??= { value: compute() }).value;
}
