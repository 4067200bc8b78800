/**
 * Drizzle rebuilds a query's SQL text on every call, which costs several times more than running
 * the small list queries of this app on SQLite. A list with optional filters has only a few
 * shapes (which filters are present, who is asking): build each shape once with
 * `sql.placeholder(...)` values, `.prepare()` it, and reuse it (Drizzle's prepared statements).
 * `shape` must encode everything the builder branches on; the values go in as placeholders.
 */
export function byShape<T>(build: (shape: string) => T): (shape: string) => T {
  const built = new Map<string, T>();
  return (shape) => {
    let query = built.get(shape);
    if (query === undefined) {
      query = build(shape);
      built.set(shape, query);
    }
    return query;
  };
}

/** `"1"`/`"0"` flags, in order, for a shape key. */
export const flags = (...present: unknown[]): string =>
  present.map((p) => (p ? '1' : '0')).join('');
