/** Top-level fields whose values differ between two snapshots of a record, in a stable order. */
export function changedFields(
  before: unknown,
  after: unknown,
  ignore: readonly string[] = [],
): string[] {
  const a = (before ?? {}) as Record<string, unknown>;
  const b = (after ?? {}) as Record<string, unknown>;
  const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])].filter(
    (key) => !ignore.includes(key),
  );
  return keys.filter((key) => JSON.stringify(a[key]) !== JSON.stringify(b[key])).sort();
}
