/**
 * The cautions every study carries (design: "Cautions"). The sentences are the ones the study
 * templates use, so the editor and the PDF say the same. Safety-critical engagements get them
 * emphasised before anything else, and again at the end.
 */
import type { Content } from 'pdfmake/interfaces';
import { CAUTION_SENTENCES } from '../../templates/doc-builders';
import { txt } from './inline-text';
import { COLOURS } from './pdf-theme';

const SAFETY_LEAD =
  "This study concerns a service where people's health or safety can depend on capacity. Where this study and local rules or licensed professional practice differ, the local rules and that practice prevail.";

/** The cautions section at the end of the report (always present). */
export function cautionsSection(): Content[] {
  // Heading and text stay on one page together.
  return [
    {
      stack: [{ text: 'Cautions', style: 'h1', tocItem: true, tocStyle: { bold: true }, tocMargin: [0, 5, 0, 0] }, txt(CAUTION_SENTENCES.join(' '), { style: 'paragraph' })],
      unbreakable: true,
    } as Content,
  ];
}

/** The emphasised box shown first in safety-critical studies. */
export function safetyCautionsBox(): Content {
  return {
    table: {
      widths: ['*'],
      body: [
        [
          {
            stack: [
              txt('Before you use any figure in this study', { bold: true, fontSize: 12, color: COLOURS.error, margin: [0, 0, 0, 6] }),
              txt(SAFETY_LEAD, { bold: true, margin: [0, 0, 0, 6] }),
              txt(CAUTION_SENTENCES.join(' '), {}),
            ],
          },
        ],
      ],
    },
    layout: { hLineWidth: () => 1.2, vLineWidth: () => 1.2, hLineColor: () => COLOURS.error, vLineColor: () => COLOURS.error, paddingLeft: () => 12, paddingRight: () => 12, paddingTop: () => 10, paddingBottom: () => 10 },
    margin: [0, 0, 0, 18],
  } as Content;
}
