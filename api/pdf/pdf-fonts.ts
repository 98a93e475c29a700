/**
 * Fonts of the PDF, loaded and parsed once per process.
 *
 * - pdfmake 0.3 takes fonts by name only, so each face is put in pdfmake's in-memory file system
 *   and nothing is read from disk or network while rendering (both access policies refuse).
 * - Parsing a face (and its layout tables) cost ~100 ms per face per document. fontkit's public
 *   `registerFormat` lets a format claim a buffer: the file system holds a short token per face
 *   and the registered format hands back the font parsed at start-up. Font objects are read-only
 *   to pdfkit (each document makes its own subset), so sharing them is safe.
 * - Merriweather's latin file has no Greek (ρ, λ, μ) and no face here ships ≤ or ∞; pdfmake has no
 *   per-glyph fallback, so `fontRuns` splits text into runs by which face has the glyphs, ending
 *   with Roboto (shipped inside pdfmake), which covers the rest.
 * - .woff only: fontkit crashes on .woff2 (stack notes). WOFF is unpacked to sfnt once (node zlib).
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import pdfmake from 'pdfmake';
import type { TFontDictionary } from 'pdfmake/interfaces';
import { woffToSfnt } from './woff-to-sfnt';

const require = createRequire(import.meta.url);
type Style = 'normal' | 'bold' | 'italics' | 'bolditalics';
type Files = Record<Style, string>;

const fontsource = (pkg: string, subset: string, weight: number, boldWeight: number): Files => {
  const file = (w: number, s: string): string => require.resolve(`@fontsource/${pkg}/files/${pkg}-${subset}-${w}-${s}.woff`);
  return { normal: file(weight, 'normal'), bold: file(boldWeight, 'normal'), italics: file(weight, 'italic'), bolditalics: file(boldWeight, 'italic') };
};
const robotoDir = require.resolve('pdfmake').replace(/js[\\/]index\.js$/, 'fonts/Roboto/');
const ROBOTO: Files = { normal: `${robotoDir}Roboto-Regular.ttf`, bold: `${robotoDir}Roboto-Medium.ttf`, italics: `${robotoDir}Roboto-Italic.ttf`, bolditalics: `${robotoDir}Roboto-MediumItalic.ttf` };

const FILES: Record<string, Files> = {
  Serif: fontsource('merriweather', 'latin', 400, 700),
  SerifExt: fontsource('merriweather', 'latin-ext', 400, 700),
  Sans: fontsource('inter', 'latin', 400, 600),
  SansExt: fontsource('inter', 'latin-ext', 400, 600),
  SansGreek: fontsource('inter', 'greek', 400, 600),
};

/** The family that starts a chain: "Serif" for document text, "Sans" for small print. */
export type BaseFamily = 'Serif' | 'Sans';
/** Each chain ends, implicitly, in Roboto (see below), which covers every character we print. */
const CHAINS: Record<BaseFamily, string[]> = { Serif: ['Serif', 'SerifExt'], Sans: ['Sans', 'SansExt', 'SansGreek'] };

/**
 * Roboto is the last fallback and the font of chart text (SVG text cannot be split into runs, so
 * one face that covers all). pdfmake hands SVG fonts to pdfkit by file name, bypassing its
 * in-memory files, so this family is named by real path and the local access policy admits
 * exactly these files. Text runs must use the same names: pdfkit caches an opened face under the
 * name it was asked for, and a face first opened another way is re-read for every chart label.
 */
export const CHART_FONT = 'Roboto';
const CHART_PATHS = new Set(Object.values(ROBOTO));
/** The local access policy of rendering: only the chart font files. */
export const mayReadLocalFile = (path: string): boolean => CHART_PATHS.has(path);

interface FontkitFont {
  hasGlyphForCodePoint(cp: number): boolean;
}
interface Fontkit {
  create(b: Uint8Array): FontkitFont;
  registerFormat(format: unknown): void;
}

const TOKEN_PREFIX = 'SJNFONT:';
const parsed = new Map<string, FontkitFont>();

/** A fontkit "format" that recognises our tokens and returns the already parsed face. */
class ParsedFontFormat {
  static probe(buffer: Uint8Array): boolean {
    return buffer.length < 64 && Buffer.from(buffer).toString('latin1').startsWith(TOKEN_PREFIX);
  }
  constructor(stream: { buffer: Uint8Array }) {
    const face = parsed.get(Buffer.from(stream.buffer).toString('latin1'));
    if (!face) throw new Error('unknown font token');
    return face as unknown as ParsedFontFormat; // a constructor may return another object
  }
}

let dictionary: Record<string, Files> | null = null;

function load(): Record<string, Files> {
  if (dictionary) return dictionary;
  // fontkit comes with pdfmake's pdfkit; resolve that very copy so the format registers where pdfkit looks.
  const fontkit = createRequire(require.resolve('pdfmake'))('fontkit') as Fontkit;
  fontkit.registerFormat(ParsedFontFormat);
  const vfs = (pdfmake as unknown as { virtualfs: { writeFileSync(name: string, content: Buffer): void } }).virtualfs;
  const out: Record<string, Files> = {};
  for (const [family, files] of Object.entries(FILES)) {
    const names = {} as Files;
    for (const [style, path] of Object.entries(files) as [Style, string][]) {
      const token = `${TOKEN_PREFIX}${family}-${style}`;
      parsed.set(token, fontkit.create(woffToSfnt(readFileSync(path))));
      vfs.writeFileSync(token, Buffer.from(token, 'latin1'));
      names[style] = token;
    }
    out[family] = names;
  }
  out.Roboto = { ...ROBOTO };
  dictionary = out;
  return out;
}

/** The pdfmake font dictionary (a fresh copy: pdfmake rewrites the entries it is given). */
export const pdfFonts = (): TFontDictionary => structuredClone(load());

const familyCache = new Map<string, string>();

function familyFor(cp: number, base: BaseFamily): string {
  const key = `${base}:${cp}`;
  let family = familyCache.get(key);
  if (family === undefined) {
    const chain = CHAINS[base];
    const faces = load();
    // Whitespace and controls stay in the base font so runs do not split on every space.
    family = cp <= 0x20 ? chain[0] : (chain.find((f) => parsed.get(faces[f].normal)?.hasGlyphForCodePoint(cp)) ?? 'Roboto');
    familyCache.set(key, family);
  }
  return family;
}

/** `text` cut into runs of one font each, in the given chain. Usually one run. */
export function fontRuns(text: string, base: BaseFamily): { text: string; font: string }[] {
  const runs: { text: string; font: string }[] = [];
  for (const ch of text) {
    const font = familyFor(ch.codePointAt(0) ?? 0, base);
    const last = runs[runs.length - 1];
    if (last && last.font === font) last.text += ch;
    else runs.push({ text: ch, font });
  }
  return runs;
}
