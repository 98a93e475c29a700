/**
 * Locates the one signature of a PDF and checks its frame: /ByteRange [0 a b c] must cover the
 * whole file except the /Contents hex slot, the slot must hold lowercase hex (one DER object,
 * then zero padding). Returns the DER, the signed bytes and the signature's /Reason.
 */
export type FoundSignature =
  | { kind: 'none' }
  | { kind: 'malformed'; problem: string }
  | { kind: 'ok'; der: Buffer; signedBytes: Buffer; signatureReason: string | null };

const BYTE_RANGE = /\/ByteRange\s*\[\s*(\d+)\s+(\d+)\s+(\d+)\s+(\d+)\s*\]/g;

/** Length of the DER object at the start of `der` (tag, length octets, content), or null. */
function derLength(der: Buffer): number | null {
  if (der.length < 2 || der[0] !== 0x30) return null;
  const first = der[1];
  if (first < 0x80) return 2 + first;
  const octets = first & 0x7f;
  if (octets === 0 || octets > 4 || der.length < 2 + octets) return null;
  let length = 0;
  for (let i = 0; i < octets; i++) length = length * 256 + der[2 + i];
  return 2 + octets + length;
}

/** A PDF literal string's escapes undone (enough for the reasons we write). */
function unescapePdfString(s: string): string {
  return s.replace(/\\([nrtbf()\\])/g, (_, c: string) => ({ n: '\n', r: '\r', t: '\t', b: '\b', f: '\f' })[c] ?? c);
}

export function findSignature(pdf: Buffer): FoundSignature {
  const text = pdf.toString('latin1');
  const ranges = [...text.matchAll(BYTE_RANGE)];
  if (ranges.length === 0) return text.includes('/ByteRange') ? { kind: 'malformed', problem: 'The signature’s byte range is unreadable.' } : { kind: 'none' };
  if (ranges.length > 1) return { kind: 'malformed', problem: 'The file carries more than one signature; a deliverable carries exactly one.' };
  const [a, b, c, d] = ranges[0].slice(1, 5).map(Number);
  if (a !== 0 || b <= 0 || c <= b + 1 || c + d !== pdf.length) {
    return { kind: 'malformed', problem: 'The signature does not cover the whole file (bytes were added or removed after signing).' };
  }
  if (pdf[b] !== 0x3c || pdf[c - 1] !== 0x3e || !/\/Contents\s*$/.test(text.slice(Math.max(0, b - 40), b))) {
    return { kind: 'malformed', problem: 'The signature slot is not where the byte range says.' };
  }
  const hex = text.slice(b + 1, c - 1);
  if (!/^[0-9a-f]+$/.test(hex) || hex.length % 2 !== 0) return { kind: 'malformed', problem: 'The signature slot holds something other than the signature.' };
  const slot = Buffer.from(hex, 'hex');
  const length = derLength(slot);
  if (length === null || length > slot.length) return { kind: 'malformed', problem: 'The signature slot holds no complete signature.' };
  if (slot.subarray(length).some((byte) => byte !== 0)) return { kind: 'malformed', problem: 'The signature slot was changed after signing.' };
  const dict = text.slice(Math.max(0, text.lastIndexOf('<<', ranges[0].index)), c + 2000);
  const reason = /\/Reason\s*\(((?:\\.|[^\\)])*)\)/.exec(dict)?.[1];
  return {
    kind: 'ok',
    der: slot.subarray(0, length),
    signedBytes: Buffer.concat([pdf.subarray(0, b), pdf.subarray(c, c + d)]),
    signatureReason: reason === undefined ? null : unescapePdfString(reason),
  };
}
