/** The timestamp reader against Date.parse, Date.UTC and Intl (the reference implementations) on generated cells. */
import { describe, expect, it } from 'vitest';
import { createLocalClock } from '../../../shared/queue/fit/local-clock';
import { createRng, type Rng } from '../../../shared/queue/sim/rng';
import { daysFromCivil } from './days-from-civil';
import { createTimestampParser, type ParsedTime } from './timestamp-parser';

const pad = (n: number, w = 2) => String(n).padStart(w, '0');
const int = (rng: Rng, lo: number, hi: number) => lo + Math.floor(rng.next() * (hi - lo + 1));
const pick = <T>(rng: Rng, xs: readonly T[]): T => xs[Math.floor(rng.next() * xs.length)];

interface Parts {
  y: number; mo: number; d: number; h: number; mi: number; s: number | null; frac: string; zone: 'none' | 'Z' | number;
}

/** Random fields, some out of range (31 April, hour 24) so refusals are tested too. */
function parts(rng: Rng): Parts {
  const zone = pick(rng, ['none', 'Z', 'offset'] as const);
  const s = rng.next() < 0.1 ? null : int(rng, 0, 59);
  return {
    y: int(rng, 1900, 2100), mo: int(rng, 1, 12), d: int(rng, 1, 31), h: int(rng, 0, rng.next() < 0.05 ? 24 : 23), mi: int(rng, 0, 59),
    s, frac: s === null || rng.next() < 0.5 ? '' : String(int(rng, 0, 999_999_999)).slice(0, int(rng, 1, 9)),
    zone: zone === 'offset' ? int(rng, -14 * 4, 14 * 4) * 15 : zone,
  };
}

const offsetText = (m: number, colon = true) => `${m < 0 ? '-' : '+'}${pad(Math.floor(Math.abs(m) / 60))}${colon ? ':' : ''}${pad(Math.abs(m) % 60)}`;

/** The form Date.parse reads exactly (ECMA-262 date time string format): T, Z or ±HH:MM, 3-digit fraction. */
function canonical(p: Parts): string {
  const zone = p.zone === 'none' ? 'Z' : p.zone === 'Z' ? 'Z' : offsetText(p.zone);
  return `${p.y}-${pad(p.mo)}-${pad(p.d)}T${pad(p.h)}:${pad(p.mi)}:${pad(p.s ?? 0)}.${p.frac.padEnd(3, '0').slice(0, 3)}${zone}`;
}

/** The same instant written the ways exports write it: space separator, lower case, comma, HHMM offsets, padding. */
function variant(rng: Rng, p: Parts): string {
  const sep = pick(rng, ['T', 'T', ' ', 't']);
  const sec = p.s === null ? '' : `:${pad(p.s)}${p.frac ? pick(rng, ['.', '.', ',']) + p.frac : ''}`;
  const zone = p.zone === 'none' ? '' : p.zone === 'Z' ? pick(rng, ['Z', 'Z', 'z']) : pick(rng, [offsetText(p.zone), offsetText(p.zone), offsetText(p.zone, false)]);
  const space = zone && rng.next() < 0.1 ? ' ' : '';
  const text = `${p.y}-${pad(p.mo)}-${pad(p.d)}${sep}${pad(p.h)}:${pad(p.mi)}${sec}${space}${zone}`;
  return rng.next() < 0.1 ? ` ${text} ` : text;
}

/** Whether the calendar date exists. source: Date.parse, which rolls 31 April over into May. */
const dateExists = (p: Parts) => new Date(Date.parse(`${p.y}-${pad(p.mo)}-${pad(p.d)}T00:00:00Z`)).toISOString().slice(0, 10) === `${p.y}-${pad(p.mo)}-${pad(p.d)}`;

const read = (cell: string, zone = 'UTC'): ParsedTime | null => {
  const into: ParsedTime = { ms: NaN, offsetMinutes: null };
  return createTimestampParser('iso8601', createLocalClock(zone))(cell, into) ? into : null;
};

describe('createTimestampParser (ISO 8601)', () => {
  it('reads 20 000 generated timestamps as Date.parse does, and refuses the dates that do not exist', () => {
    const rng = createRng(11);
    for (let n = 0; n < 20_000; n++) {
      const p = parts(rng);
      const cell = variant(rng, p);
      const got = read(cell);
      if (!dateExists(p) || p.h > 23) {
        expect(got, cell).toBeNull();
        continue;
      }
      // source: Date.parse of the canonical form; it keeps whole milliseconds, the reader the fraction.
      const ref = Date.parse(canonical(p));
      expect(got, cell).not.toBeNull();
      expect(got!.ms - ref, cell).toBeGreaterThanOrEqual(0);
      expect(got!.ms - ref, cell).toBeLessThan(1);
      if (p.frac.length <= 3) expect(got!.ms, cell).toBe(ref);
      expect(got!.offsetMinutes, cell).toBe(p.zone === 'none' ? null : p.zone === 'Z' ? 0 : p.zone);
    }
  });

  it('reads a time without offset in the mapping zone: Intl shows the same wall clock there', () => {
    const rng = createRng(12);
    const berlin = new Intl.DateTimeFormat('sv-SE', { timeZone: 'Europe/Berlin', year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', second: '2-digit', hourCycle: 'h23' });
    for (let n = 0; n < 2000; n++) {
      const p = { ...parts(rng), zone: 'none' as const, frac: '' };
      if (!dateExists(p) || p.h > 23 || p.s === null) continue;
      // Skip the hour that does not exist when clocks go forward (last Sunday of March, 02:00–03:00).
      if (p.mo === 3 && p.h === 2 && p.d > 24) continue;
      const cell = variant(rng, p);
      const got = read(cell, 'Europe/Berlin');
      // source: Intl.DateTimeFormat (ICU time-zone data), formatting the instant back in Berlin.
      expect(berlin.format(got!.ms), cell).toBe(`${p.y}-${pad(p.mo)}-${pad(p.d)} ${pad(p.h)}:${pad(p.mi)}:${pad(p.s)}`);
    }
  });

  it.each([
    ['', 'empty'],
    ['2026-01-05', 'no time'],
    ['2026-1-5T08:00:00Z', 'unpadded'],
    ['2026-01-05T08:00:00.Z', 'empty fraction'],
    ['2026-01-05T08:00:00.1234567890Z', 'ten fraction digits'],
    ['2026-01-05T08:00:00ZZ', 'two zones'],
    ['2026-01-05T08:00:00+1', 'one-digit offset'],
    ['2026-01-05T08:60:00Z', 'minute 60'],
    ['2026-02-29T08:00:00Z', '29 February of a common year'],
    ['2026-13-01T08:00:00Z', 'month 13'],
    ['yesterday', 'a word'],
    ['1767600000', 'an epoch number'],
  ])('refuses %j (%s), as the ISO 8601 grammar of the mapping does', (cell) => {
    expect(read(cell)).toBeNull();
  });

  it('reads a leap second as the next minute, as Date.UTC does', () => {
    // source: Date.UTC(2026, 0, 5, 8, 59, 60) rolls over to 09:00:00.
    expect(read('2026-01-05T08:59:60Z')!.ms).toBe(Date.UTC(2026, 0, 5, 8, 59, 60));
  });

  it('reads epoch seconds and milliseconds, refusing what Number would stretch to read', () => {
    const into: ParsedTime = { ms: NaN, offsetMinutes: null };
    const seconds = createTimestampParser('epoch_seconds', (x) => x);
    expect(seconds(' 1767600000.5 ', into) && into.ms).toBe(1_767_600_000_500);
    for (const cell of ['', '1e9', '0x10', 'Infinity', '12abc']) expect(seconds(cell, into), cell).toBe(false);
    expect(createTimestampParser('epoch_milliseconds', (x) => x)('-1500', into) && into.ms).toBe(-1500);
  });
});

describe('daysFromCivil', () => {
  it('agrees with Date.UTC on 5000 random dates of years 100 to 9999', () => {
    const rng = createRng(13);
    for (let n = 0; n < 5000; n++) {
      const y = int(rng, 100, 9999), m = int(rng, 1, 12), d = int(rng, 1, 28);
      // source: Date.UTC (ECMA-262 MakeDay), exact for years ≥ 100.
      expect(daysFromCivil(y, m, d) * 86_400_000, `${y}-${m}-${d}`).toBe(Date.UTC(y, m - 1, d));
    }
  });
});
