/**
 * renderStudyPdf(snapshot, signOff) → the study report as a PDF buffer.
 *
 * Pure in the sense that matters for moving it to a worker thread later: the output depends only
 * on the arguments (fonts are read once per process from the installed packages; nothing is
 * fetched: URL and local-file access policies refuse everything). Order of the report: cover,
 * (safety cautions), contents, the sections, assumptions appendix, method notes, cautions,
 * sign-off page. With `signOff` null the PDF is a preview marked "Not yet approved".
 */
import pdfmake from 'pdfmake';
import type { Content, TDocumentDefinitions } from 'pdfmake/interfaces';
import type { RevisionSnapshot, SignOff } from '../../shared/schemas/revisions';
import { assumptionsAppendix, collectMethods, methodNotes } from './appendix-content';
import { cautionsSection, safetyCautionsBox } from './cautions-content';
import { chartSvg } from './chart-svg';
import { coverPage } from './cover-page';
import { children, type DocNode } from './doc-node';
import { sans } from './inline-text';
import { keepWithNext } from './keep-with-next';
import { mapNode, parseBlockConfig } from './node-mapping';
import { mayReadLocalFile, pdfFonts } from './pdf-fonts';
import { COLOURS, STYLES } from './pdf-theme';
import { signOffPage } from './sign-off-page';

/** The keyword prefix under which the revision's SHA-256 is stored in the PDF metadata. */
export const SHA_KEYWORD = 'sojourn-revision-sha256:';

function modelBlockNodes(node: DocNode, out: DocNode[] = []): DocNode[] {
  if (node.type === 'modelBlock') out.push(node);
  for (const c of children(node)) modelBlockNodes(c, out);
  return out;
}

/** Each charted block's SVG, rendered once even if a block id appears twice. */
async function renderCharts(nodes: DocNode[], snapshot: RevisionSnapshot): Promise<Map<string, string | null>> {
  const charts = new Map<string, string | null>();
  for (const node of nodes) {
    const blockId = String(node.attrs?.blockId ?? '');
    if (charts.has(blockId)) continue;
    const config = parseBlockConfig(node.attrs?.config);
    const block = snapshot.blocks[blockId];
    charts.set(blockId, config?.chart && block?.chart ? await chartSvg(config, block) : null);
  }
  return charts;
}

export async function renderStudyPdf(snapshot: RevisionSnapshot, signOff: SignOff | null): Promise<Buffer> {
  const document = snapshot.document as DocNode;
  const nodes = modelBlockNodes(document);
  const charts = await renderCharts(nodes, snapshot);
  // A heading never sits alone at the foot of a page.
  const body = keepWithNext(mapNode(document, { blocks: snapshot.blocks, charts }));
  const used = nodes
    .map((n) => ({ title: parseBlockConfig(n.attrs?.config)?.title || 'Untitled model block', result: snapshot.blocks[String(n.attrs?.blockId ?? '')] }))
    .filter((b) => b.result !== undefined);

  const content: Content[] = [
    ...coverPage(snapshot, signOff),
    ...(snapshot.engagement.safetyCritical ? [safetyCautionsBox()] : []),
    { toc: { title: { text: 'Contents', style: 'h1' }, textStyle: { fontSize: 10 }, numberStyle: { fontSize: 10, fontFeatures: ['tnum'] } } } as Content,
    { text: '', pageBreak: 'after' },
    ...body,
    ...assumptionsAppendix(snapshot.assumptions),
    ...methodNotes(collectMethods(used)),
    ...cautionsSection(),
    ...signOffPage(snapshot, signOff),
  ];

  const title = snapshot.study.title;
  const definition: TDocumentDefinitions = {
    pageSize: 'A4',
    pageMargins: [62, 64, 62, 60],
    info: {
      title,
      author: snapshot.engagement.name,
      subject: `${title}, revision ${snapshot.number}${signOff ? '' : ' (preview, not yet approved)'}`,
      keywords: signOff ? `${SHA_KEYWORD}${signOff.sha256}` : 'sojourn-preview',
      creator: 'Sojourn',
      creationDate: new Date(signOff?.releasedAt ?? snapshot.submittedAt),
    },
    defaultStyle: { font: 'Serif', fontSize: 10, lineHeight: 1.3, color: COLOURS.ink },
    styles: STYLES,
    header: (page: number) =>
      page === 1 ? null : { columns: [sans(snapshot.engagement.name, { fontSize: 7.5, color: COLOURS.muted }), sans(`Revision ${snapshot.number}${signOff ? '' : ' · preview'}`, { fontSize: 7.5, color: COLOURS.muted, alignment: 'right' })], margin: [62, 30, 62, 0] },
    footer: (page: number, pages: number) =>
      page === 1 ? null : { columns: [sans(title, { fontSize: 7.5, color: COLOURS.muted }), sans(`Page ${page} of ${pages}`, { fontSize: 7.5, color: COLOURS.muted, alignment: 'right' })], margin: [62, 20, 62, 0] },
    content,
  };

  pdfmake.setFonts(pdfFonts());
  pdfmake.setUrlAccessPolicy(() => false);
  pdfmake.setLocalAccessPolicy(mayReadLocalFile);
  return pdfmake.createPdf(definition).getBuffer();
}
