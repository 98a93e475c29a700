/** The cover: engagement, client, study title, revision, date, status and approver. */
import type { Content } from 'pdfmake/interfaces';
import type { RevisionSnapshot, SignOff } from '../../shared/schemas/revisions';
import { formatDate } from './format-date';
import { sans, txt } from './inline-text';
import { COLOURS } from './pdf-theme';

const field = (label: string, value: string): Content[] => [
  sans(label.toUpperCase(), { fontSize: 7.5, color: COLOURS.muted, characterSpacing: 0.6, margin: [0, 10, 0, 1] }),
  txt(value, { fontSize: 11 }),
];

export function coverPage(snapshot: RevisionSnapshot, signOff: SignOff | null): Content[] {
  const status = signOff ? 'Released — approved and signed' : 'Preview — not yet approved';
  return [
    { canvas: [{ type: 'rect', x: 0, y: 0, w: 40, h: 4, color: COLOURS.accent }], margin: [0, 90, 0, 18] } as Content,
    sans(snapshot.engagement.name, { fontSize: 11, color: COLOURS.muted, margin: [0, 0, 0, 6] }),
    txt(snapshot.study.title, { style: 'cover', margin: [0, 0, 0, 8] }),
    txt(`Capacity study for ${snapshot.engagement.clientName}`, { fontSize: 13, color: COLOURS.ink, margin: [0, 0, 0, 40] }),
    {
      columns: [
        { width: '*', stack: [...field('Revision', String(snapshot.number)), ...field('Date', formatDate(signOff?.releasedAt ?? snapshot.submittedAt)), ...field('Prepared by', snapshot.submittedBy)] },
        {
          width: '*',
          stack: [
            ...field('Status', status),
            ...field('Approved by', signOff ? signOff.approverName : 'Not yet approved'),
            ...field('Client', snapshot.engagement.clientName),
          ],
        },
      ],
    } as Content,
    sans(
      signOff
        ? 'This file is digitally signed by the firm. The sign-off page at the end names the approver and the fingerprint (SHA-256) of the approved revision.'
        : 'This is a preview. It carries no approval and no digital signature, and its figures may still change.',
      { fontSize: 8, color: COLOURS.muted, margin: [0, 60, 0, 0] },
    ),
    { text: '', pageBreak: 'after' },
  ];
}
