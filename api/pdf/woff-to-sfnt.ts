/**
 * WOFF 1.0 → plain sfnt (TrueType/OpenType) bytes. fontkit inflates WOFF tables with a pure-JS
 * inflater on every document, which made each embedded face cost a few hundred milliseconds;
 * unpacking once per process with node's zlib removes that. Format: W3C WOFF 1.0, §4–§5.
 */
import { inflateSync } from 'node:zlib';

const WOFF_SIGNATURE = 0x774f4646; // 'wOFF'

export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.readUInt32BE(0) !== WOFF_SIGNATURE) return woff; // already sfnt
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables: { tag: number; checksum: number; data: Buffer }[] = [];
  for (let i = 0; i < numTables; i++) {
    const at = 44 + i * 20;
    const tag = woff.readUInt32BE(at);
    const offset = woff.readUInt32BE(at + 4);
    const compLength = woff.readUInt32BE(at + 8);
    const origLength = woff.readUInt32BE(at + 12);
    const checksum = woff.readUInt32BE(at + 16);
    const raw = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(raw) : Buffer.from(raw);
    if (data.length !== origLength) throw new Error('WOFF table length mismatch');
    tables.push({ tag, checksum, data });
  }
  // sfnt header: search range fields from the largest power of two ≤ numTables.
  let entrySelector = 0;
  while (2 ** (entrySelector + 1) <= numTables) entrySelector++;
  const searchRange = 2 ** entrySelector * 16;
  const headerLength = 12 + numTables * 16;
  const total = headerLength + tables.reduce((n, t) => n + ((t.data.length + 3) & ~3), 0);
  const out = Buffer.alloc(total);
  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(searchRange, 6);
  out.writeUInt16BE(entrySelector, 8);
  out.writeUInt16BE(numTables * 16 - searchRange, 10);
  let offset = headerLength;
  tables.forEach((t, i) => {
    const at = 12 + i * 16;
    out.writeUInt32BE(t.tag, at);
    out.writeUInt32BE(t.checksum, at + 4);
    out.writeUInt32BE(offset, at + 8);
    out.writeUInt32BE(t.data.length, at + 12);
    t.data.copy(out, offset);
    offset += (t.data.length + 3) & ~3;
  });
  return out;
}
