const plain = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 6 });

/** A stored value as typed numbers read: grouping, up to six decimals, no trailing zeros. */
export function formatValue(value: number): string {
  return plain.format(value);
}

/** The text before and after the decimal point ("1,250" / ".75"), for columns aligned on the point. */
export function splitDecimal(text: string): { whole: string; fraction: string } {
  const at = text.indexOf('.');
  return at === -1 ? { whole: text, fraction: '' } : { whole: text.slice(0, at), fraction: text.slice(at) };
}

/**
 * What a person typed into a value field, as a number: spaces and thousands commas are ignored
 * ("1,250.5" → 1250.5). Empty gives undefined so the schema says "Enter a number".
 */
export function parseValue(text: string): number | undefined {
  const cleaned = text.replace(/[\s,_\u202f]/g, '');
  if (cleaned === '') return undefined;
  return Number(cleaned);
}
