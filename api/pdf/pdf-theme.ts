/**
 * The look of the PDF: a quiet printed report. One accent colour (headings, rules, links), ink
 * for text, a muted grey for small print, and two status colours that keep their meaning
 * (warnings, errors) and pass contrast on white.
 */
import type { StyleDictionary } from 'pdfmake/interfaces';

export const COLOURS = {
  ink: '#1d1f24',
  muted: '#5c6070',
  rule: '#c9ccd6',
  shade: '#f3f4f7',
  accent: '#1f5a73',
  warning: '#7a4b00',
  error: '#9d1c1c',
} as const;

/** Numbers use tabular lining figures so right-aligned columns line up digit by digit. */
export const NUMBER_FEATURES = ['tnum', 'lnum'];

export const STYLES: StyleDictionary = {
  h1: { fontSize: 17, bold: true, color: COLOURS.accent, margin: [0, 18, 0, 8] },
  h2: { fontSize: 13.5, bold: true, color: COLOURS.ink, margin: [0, 14, 0, 6] },
  h3: { fontSize: 11.5, bold: true, italics: true, color: COLOURS.ink, margin: [0, 10, 0, 4] },
  paragraph: { margin: [0, 0, 0, 7] },
  quote: { italics: true, color: COLOURS.muted },
  small: { font: 'Sans', fontSize: 8, color: COLOURS.muted },
  tableHead: { font: 'Sans', fontSize: 8, bold: true, color: COLOURS.ink },
  tableCell: { fontSize: 9 },
  blockTitle: { fontSize: 11, bold: true, color: COLOURS.ink },
  blockMeta: { font: 'Sans', fontSize: 8, color: COLOURS.muted },
  warning: { fontSize: 9, color: COLOURS.warning },
  error: { fontSize: 9.5, color: COLOURS.error },
  caption: { font: 'Sans', fontSize: 8, color: COLOURS.muted, margin: [0, 2, 0, 0] },
  cover: { fontSize: 26, bold: true, color: COLOURS.ink },
  label: { font: 'Sans', fontSize: 8, color: COLOURS.muted, characterSpacing: 0.4 },
  mono: { font: 'Sans', fontSize: 8.5 },
};
