/** The record splitter against csv-parse (the reference implementation) on generated files. */
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { createRng, type Rng } from '../../../shared/queue/sim/rng';
import { DATASET_MAX_LINE } from '../../../shared/schemas/datasets';
import { DatasetInputError } from './dataset-problem';
import { createRecordSplitter } from './record-splitter';

/** csv-parse with the options the fit used before the splitter existed: the reference. */
const csvParse = (text: string, delimiter: string): string[][] => parse(text, { delimiter, bom: true, skip_empty_lines: true, relax_quotes: true, max_record_size: DATASET_MAX_LINE }) as string[][];

/** Our splitter, fed `text` cut at the given offsets (lines, CRLF pairs and quotes may be cut anywhere). */
function split(text: string, delimiter: string, cuts: number[] = []): { records: string[][]; lines: number[] } {
  const records: string[][] = [];
  const lines: number[] = [];
  const s = createRecordSplitter(delimiter, (cells, line) => {
    records.push(cells);
    lines.push(line);
  });
  let from = 0;
  for (const at of [...cuts].sort((a, b) => a - b)) {
    s.push(text.slice(from, at));
    from = at;
  }
  s.push(text.slice(from));
  s.end();
  return { records, lines };
}

const pick = <T>(rng: Rng, xs: readonly T[]): T => xs[Math.floor(rng.next() * xs.length)];

/** One field: plain, empty, accented, or quoted with delimiters, doubled quotes and line breaks inside. */
function field(rng: Rng, delimiter: string, eol: string, quotes: boolean): string {
  const plain = pick(rng, ['2026-01-05T08:00:00Z', 'desk', '', ' padded ', 'café', '€12', '42', 'x y']);
  if (!quotes || rng.next() < 0.6) return plain;
  switch (Math.floor(rng.next() * 8)) {
    case 6:
      return `"ends ""${eol}quoted"""`; // a doubled quote just before a line break: still inside
    case 7:
      return '""';
    case 0:
      return `"${plain}"`;
    case 1:
      return `"a${delimiter}b"`;
    case 2:
      return `"say ""hi"""`;
    case 3:
      return `"two${eol}lines${eol}${eol}here"`;
    case 4:
      return `ab"c`; // a quote inside an unquoted field: literal with relax_quotes
    default:
      return `"x"y`; // text after a closing quote: the field becomes literal
  }
}

/** A whole file: header and rows of the same width, blank lines, optional BOM and final line break. */
function file(rng: Rng, delimiter: string, eol: string, quotes: boolean): string {
  const width = 1 + Math.floor(rng.next() * 4);
  const trailing = rng.next() < 0.2 ? delimiter : '';
  const lines = [Array.from({ length: width }, (_, i) => `col${i}`).join(delimiter) + trailing];
  const rows = Math.floor(rng.next() * 8);
  for (let r = 0; r < rows; r++) {
    if (rng.next() < 0.15) lines.push('');
    lines.push(Array.from({ length: width }, () => field(rng, delimiter, eol, quotes)).join(delimiter) + trailing);
  }
  return (rng.next() < 0.2 ? '\uFEFF' : '') + lines.join(eol) + (rng.next() < 0.7 ? eol : '');
}

describe('createRecordSplitter', () => {
  it.each([
    [',', '\n'],
    [',', '\r\n'],
    [';', '\r'],
    ['\t', '\n'],
    ['|', '\r\n'],
  ])('gives the records csv-parse gives on 400 generated files (delimiter %j, line break %j), however the text is cut', (delimiter, eol) => {
    const rng = createRng(eol.length * 31 + delimiter.charCodeAt(0));
    for (let n = 0; n < 400; n++) {
      const text = file(rng, delimiter, eol, n % 4 !== 0);
      const cuts = Array.from({ length: Math.floor(rng.next() * 5) }, () => Math.floor(rng.next() * (text.length + 1)));
      // source: csv-parse (sync API), the parser the splitter stands in for.
      const expected = csvParse(text, delimiter);
      expect(split(text, delimiter, cuts).records, JSON.stringify({ text, cuts })).toEqual(expected);
      expect(split(text, delimiter, Array.from({ length: text.length }, (_, i) => i)).records).toEqual(expected);
    }
  });

  it('refuses the same malformed files as csv-parse: a short row, an extra trailing delimiter, an unclosed quote', () => {
    for (const text of ['a,b\n1,2\n3\n', 'a,b\n1,2,\n', 'a,b\n"1,2\n3,4\n', 'a,b\n1,2\n"3\n']) {
      // source: csv-parse throws on each of these.
      expect(() => csvParse(text, ',')).toThrow();
      expect(() => split(text, ','), text).toThrow(DatasetInputError);
    }
  });

  it('names the row of a short row and of an unclosed quote', () => {
    expect(() => split('a,b\n1,2\n\n3\n', ',')).toThrow(/^Row 4: 1 field where the header has 2\. Check the delimiter/);
    expect(() => split('a,b\n1,2\n"3,4\n5,6\n', ',')).toThrow(/^Row \d: Quote Not Closed/);
  });

  it('reports the file line each record starts on, blank lines and quoted line breaks included', () => {
    const { records, lines } = split('a,b\r\n\r\n"x\r\ny",1\r\n2,3', ',');
    expect(records).toEqual([['a', 'b'], ['x\r\ny', '1'], ['2', '3']]);
    expect(lines).toEqual([1, 3, 5]);
  });

  it('refuses a line over the limit as soon as it is read, naming its row, even without a line break', () => {
    const long = 'y'.repeat(DATASET_MAX_LINE + 10);
    expect(() => split(`a,b\n1,2\n${long},3\n`, ',')).toThrow(/^Row 3: a line is longer than 65,536 characters/);
    const s = createRecordSplitter(',', () => {});
    s.push('a,b\n');
    // The splitter must not wait for the end of a line that never ends.
    expect(() => s.push(long)).toThrow(/^Row 2: a line is longer/);
    expect(() => split(`a,b\n"${'z\n'.repeat(DATASET_MAX_LINE / 2)}",1\n`, ',')).toThrow(/^Row 2: a line is longer/);
  });

  it('strips a byte-order mark only at the very start', () => {
    // source: csv-parse with bom: true.
    const text = '\uFEFFa,b\n\uFEFF1,2\n';
    expect(split(text, ',', [1, 2]).records).toEqual(csvParse(text, ','));
  });
});
