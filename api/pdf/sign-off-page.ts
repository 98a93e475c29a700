/** The sign-off page: who approved, when, when released, the revision's SHA-256 and the engine version. */
import type { Content } from 'pdfmake/interfaces';
import type { RevisionSnapshot, SignOff } from '../../shared/schemas/revisions';
import { formatDateTime } from './format-date';
import { sans, txt } from './inline-text';
import { COLOURS } from './pdf-theme';

const row = (label: string, value: Content): Content[] => [sans(label, { fontSize: 8.5, color: COLOURS.muted }), value];

export function signOffPage(snapshot: RevisionSnapshot, signOff: SignOff | null): Content[] {
  const heading = { text: 'Sign-off', style: 'h1', tocItem: true, tocStyle: { bold: true }, tocMargin: [0, 5, 0, 0], pageBreak: 'before' } as Content;
  const common: Content[][] = [
    row('Revision', txt(String(snapshot.number))),
    row('Submitted', txt(`${formatDateTime(snapshot.submittedAt)} by ${snapshot.submittedBy}`)),
    row('Engine version', sans(snapshot.engineVersion, { fontSize: 9.5 })),
  ];
  if (!signOff) {
    return [
      heading,
      txt('Not yet approved', { fontSize: 16, bold: true, color: COLOURS.warning, margin: [0, 4, 0, 8] }),
      txt('No partner has approved this revision. This preview is not a deliverable: it is not signed and its figures may change before release.', { style: 'paragraph' }),
      { table: { widths: [110, '*'], body: common }, layout: 'noBorders', margin: [0, 8, 0, 0] } as Content,
    ];
  }
  const body: Content[][] = [
    row('Approved by', txt(`${signOff.approverName} <${signOff.approverEmail}>`)),
    row('Approved at', txt(formatDateTime(signOff.approvedAt))),
    row('Released at', txt(formatDateTime(signOff.releasedAt))),
    ...common,
    row('SHA-256 of the revision', sans(signOff.sha256, { fontSize: 8.5, fontFeatures: ['tnum'] })),
  ];
  return [
    heading,
    txt(`Revision ${snapshot.number} of this study was approved and released as follows.`, { style: 'paragraph' }),
    { table: { widths: [110, '*'], body }, layout: { hLineWidth: (i: number) => (i === 0 ? 0 : 0.25), hLineColor: () => COLOURS.rule, vLineWidth: () => 0, paddingTop: () => 5, paddingBottom: () => 5 }, margin: [0, 6, 0, 14] } as Content,
    txt(
      'The SHA-256 above is the fingerprint of everything this revision froze: its text, every model block’s inputs and results, the assumptions and the engine version. The firm’s digital signature on this file covers this page and the fingerprint, so any change to the file after release makes the signature invalid.',
      { style: 'paragraph', fontSize: 9, color: COLOURS.muted },
    ),
  ];
}
