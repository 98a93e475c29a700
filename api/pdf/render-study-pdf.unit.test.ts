import { beforeAll, describe, expect, it } from 'vitest';
import { compute } from '../../shared/queue/index';
import { CAUTION_SENTENCES } from '../../templates/doc-builders';
import { LONG_TABLE_HEADER, SIGN_OFF, XSS_TEXT, studySnapshot } from './fixtures/study-snapshot';
import { POPPLER_MISSING, pdfText, poppler } from './fixtures/poppler';
import { renderStudyPdf } from './render-study-pdf';

// Reference values come straight from the engine (not from the PDF's formatter) and are rounded
// here with toFixed; poppler's pdftotext is the outside reader of the PDF.
const peak = compute({ model: 'M/M/c', arrivalRate: 3, serviceRate: 1 / 2.4, servers: 8, t: 5 }) as unknown as Record<string, number>;
const staffing = compute({ model: 'staffing', arrivalRate: 180, serviceRate: 25, criterion: 'serviceLevel', target: 0.9, t: 5 / 60 }) as unknown as { servers: number };
const normalise = (s: string) => s.replace(/\s+/g, ' ');

if (POPPLER_MISSING) console.warn(`Skipping PDF text checks: ${POPPLER_MISSING}`);

describe.skipIf(POPPLER_MISSING !== null)('renderStudyPdf (read back with poppler pdftotext)', () => {
  let text = '';
  let pdf: Buffer;
  beforeAll(async () => {
    pdf = await renderStudyPdf(studySnapshot(), SIGN_OFF);
    text = pdfText(pdf);
  }, 60_000);

  it('produces a PDF with Merriweather embedded', () => {
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    expect(poppler('pdffonts', pdf)).toMatch(/Merriweather-Regular\s+CID TrueType\s+Identity-H\s+yes yes/);
  });

  it('prints the cover, the contents and every section heading', () => {
    for (const h of ['Ticket desk capacity for the summer timetable', 'Wrenmoor Ferry Services (fictional)', 'Contents', 'Summary', 'Demand', 'Observed quarter hours', 'Desks at the peak', 'Options', 'Appendix: assumptions', 'Method notes', 'Cautions', 'Sign-off']) {
      expect(text).toContain(h);
    }
    expect(text).toContain('Revision 3');
  });

  it('prints the engine results as formatted: % with one decimal, waits in minutes, the staffing answer', () => {
    expect(text).toContain(`Service level P(wait ≤ t) % ${(peak.serviceLevel * 100).toFixed(1)}`);
    expect(text).toContain(`Mean wait in queue Wq minutes ${peak.Wq.toFixed(2)}`);
    expect(text).toContain(`Utilisation ρ % ${(peak.rho * 100).toFixed(1)}`);
    expect(text).toContain(`Servers ${staffing.servers}`);
    expect(text).toMatch(/Erlang C \(M\/M\/c\) \(exact\)/);
  });

  it('lays scenarios side by side and says when a block could not be computed', () => {
    expect(text).toContain('Base case Eight desks Ten desks Growth of 15 %');
    expect(text).toContain('This block could not be computed');
    expect(text).toContain('Eight desks: Utilisation 90.0 % is above 85.0 %');
  });

  it('prints user text literally, links with their address, and the text of unknown nodes', () => {
    expect(text).toContain(XSS_TEXT);
    expect(text).toContain('<b>not bold</b>');
    expect(text).toContain('terminal open data (https://example.org/terminal-data)');
    expect(text).toContain('Text of an unknown node survives.');
  });

  it('repeats the header row of a long table on the next page', () => {
    const headerLine = LONG_TABLE_HEADER.join(' ');
    expect(text.split(headerLine).length - 1).toBeGreaterThanOrEqual(2);
    expect(text).toContain('06:00');
    expect(text).toContain('20:45');
  });

  it('draws the chart with its axis title and panel titles', () => {
    expect(text).toContain('Servers c');
    expect(text).toContain('Mean wait in queue Wq (minutes)');
  });

  it('has the appendix, method notes, cautions and sign-off with the SHA-256', () => {
    // Table cells that wrap interleave in pdftotext's reading order: check fragments.
    expect(text).toContain('Passengers arriving at the');
    expect(text).toContain('Gate counter log, six sample');
    expect(text).toContain('Reference: A. K. Erlang (1917)');
    expect(text).toContain(normalise(CAUTION_SENTENCES.join(' ')));
    expect(text).toContain(SIGN_OFF.sha256);
    expect(text).toContain('Bram Oakes <bram.oakes@firm.example>');
    expect(text).toContain('3 April 2025, 14:05 UTC');
  });

  it('stores the SHA-256 in the PDF keywords', () => {
    expect(pdf.toString('latin1')).toContain(`sojourn-revision-sha256:${SIGN_OFF.sha256}`);
  });
});

describe.skipIf(POPPLER_MISSING !== null)('renderStudyPdf previews and safety-critical studies', () => {
  it('marks a preview "Not yet approved" and puts emphasised cautions before the contents', async () => {
    const base = studySnapshot();
    const pdf = await renderStudyPdf({ ...base, engagement: { ...base.engagement, safetyCritical: true } }, null);
    const text = pdfText(pdf);
    expect(text).toContain('Not yet approved');
    expect(text).toContain('Preview — not yet approved');
    const box = text.indexOf('Before you use any figure in this study');
    expect(box).toBeGreaterThan(-1);
    expect(box).toBeLessThan(text.indexOf('Contents'));
    expect(text.indexOf('local rules and that practice prevail')).toBeGreaterThan(-1);
  }, 60_000);
});
