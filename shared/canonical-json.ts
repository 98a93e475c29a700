/**
 * Canonical JSON: object keys sorted recursively (by UTF-16 code unit, as Array.prototype.sort
 * does), no whitespace, `undefined` members left out as JSON.stringify leaves them out. Two
 * values that JSON would store identically serialise to the same string whatever the key order,
 * so a SHA-256 of it identifies a revision's content independently of how the database or a
 * driver happens to order keys.
 */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') {
    const s = JSON.stringify(value);
    // JSON has no undefined, NaN or Infinity: JSON.stringify gives undefined or "null"; refuse
    // instead, so a hash is never taken over something that would not round-trip.
    if (s === undefined || (typeof value === 'number' && !Number.isFinite(value))) {
      throw new TypeError(`canonicalJson: ${String(value)} has no JSON form`);
    }
    return s;
  }
  if (Array.isArray(value)) return `[${value.map((v) => (v === undefined ? 'null' : canonicalJson(v))).join(',')}]`;
  const entries = Object.keys(value)
    .filter((k) => (value as Record<string, unknown>)[k] !== undefined)
    .sort()
    .map((k) => `${JSON.stringify(k)}:${canonicalJson((value as Record<string, unknown>)[k])}`);
  return `{${entries.join(',')}}`;
}
