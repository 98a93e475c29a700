/**
 * A deep copy in which every non-finite number is null: results are stored as JSON and sent to
 * browsers, where NaN and Infinity would silently become null or break parsing anyway.
 */
export function jsonSafe<T>(value: T): T {
  if (typeof value === 'number') return (Number.isFinite(value) ? value : null) as T;
  if (Array.isArray(value)) return value.map(jsonSafe) as T;
  if (typeof value === 'object' && value !== null) {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) if (v !== undefined) out[k] = jsonSafe(v);
    return out as T;
  }
  return value;
}
