import { describe, expect, it } from 'vitest';
import { HttpError } from '../../http-error';
import { sanitiseDocument } from './document-sanitiser';

const block = (blockId: unknown, spec: Record<string, unknown> = { model: 'M/M/c', arrivalRate: 10, serviceRate: 4, servers: 3 }) => ({
  type: 'modelBlock',
  attrs: { blockId, config: { title: 'Desk', timeUnit: 'hour', spec } },
});
const para = (text: string, marks?: unknown[]) => ({ type: 'paragraph', content: [{ type: 'text', text, ...(marks ? { marks } : {}) }] });
const doc = (...content: unknown[]) => ({ type: 'doc', content });

function issuesOf(input: unknown): { path: string; message: string }[] {
  try {
    sanitiseDocument(input);
  } catch (err) {
    if (err instanceof HttpError) return err.issues ?? [];
    throw err;
  }
  throw new Error('expected a validation error');
}

describe('sanitiseDocument', () => {
  it('drops unknown node types, marks and attributes', () => {
    const out = sanitiseDocument(
      doc(
        { type: 'script', content: [{ type: 'text', text: 'alert(1)' }] },
        { type: 'paragraph', attrs: { onclick: 'alert(1)', style: 'x' }, content: [{ type: 'text', text: 'kept', marks: [{ type: 'blink' }, { type: 'bold', attrs: { onmouseover: 'x' } }] }] },
      ),
    );
    expect(out.document).toEqual(doc({ type: 'paragraph', content: [{ type: 'text', text: 'kept', marks: [{ type: 'bold' }] }] }));
  });

  it('removes markup from text but keeps comparisons', () => {
    const out = sanitiseDocument(doc(para('a<script>alert(1)</script>b <img src=x onerror=alert(1)> n < c and c > 2')));
    expect(JSON.stringify(out.document)).not.toMatch(/script|onerror|<img/);
    expect(JSON.stringify(out.document)).toContain('n < c and c > 2');
  });

  it('keeps only http, https and mailto link targets', () => {
    const link = (href: string) => [{ type: 'link', attrs: { href, onclick: 'x', class: 'evil' } }];
    const out = sanitiseDocument(doc(para('bad', link('javascript:alert(1)')), para('tab', link('java\tscript:alert(1)')), para('ok', link('https://example.test/a')), para('mail', link('mailto:a@example.test'))));
    const marks = (out.document.content as { content: { marks?: { attrs: Record<string, unknown> }[] }[] }[]).map((p) => p.content[0].marks?.[0]?.attrs.href ?? null);
    expect(marks).toEqual([null, null, 'https://example.test/a', 'mailto:a@example.test']);
    expect(JSON.stringify(out.document)).not.toContain('onclick');
    expect(JSON.stringify(out.document)).not.toContain('evil');
  });

  it('keeps well-formed unique block ids and replaces missing, malformed or repeated ones', () => {
    const out = sanitiseDocument(doc(block('blockA1'), block('blockA1'), block('<b>'), block(undefined)));
    const ids = out.blocks.map((b) => b.blockId);
    expect(ids[0]).toBe('blockA1');
    expect(new Set(ids).size).toBe(4);
    for (const id of ids) expect(id).toMatch(/^[A-Za-z0-9_-]{6,40}$/);
  });

  it('gives headings unique section ids', () => {
    const h = { type: 'heading', attrs: { level: 2, sectionId: 'sect-01' }, content: [{ type: 'text', text: 'Peak' }] };
    const out = sanitiseDocument(doc(h, h));
    const [a, b] = (out.document.content as { attrs: { sectionId: string } }[]).map((n) => n.attrs.sectionId);
    expect(a).toBe('sect-01');
    expect(b).not.toBe(a);
  });

  it('reports an invalid block input at its dotted path', () => {
    expect(issuesOf(doc(para('x'), block('blockA1', { model: 'M/M/c', arrivalRate: 10, serviceRate: 4, servers: 'three' })))).toEqual([
      { path: 'document.content.1.attrs.config.spec.servers', message: 'must be a number or an assumption link' },
    ]);
    expect(issuesOf(doc(block('blockA1', { model: 'M/M/c', arrivalRate: { assumption: 'peak' }, serviceRate: 4, servers: 3 })))[0].path).toBe(
      'document.content.0.attrs.config.spec.arrivalRate',
    );
    expect(issuesOf(doc({ type: 'modelBlock', attrs: { blockId: 'blockA1', config: { spec: { model: 'M/M/1' }, timeUnit: 'week' } } }))[0].path).toBe(
      'document.content.0.attrs.config.timeUnit',
    );
  });

  it('fills a node left empty by dropped content and accepts an empty document', () => {
    expect(sanitiseDocument(doc({ type: 'blockquote', content: [{ type: 'iframe' }] })).document).toEqual(doc({ type: 'blockquote', content: [{ type: 'paragraph' }] }));
    expect(sanitiseDocument({ type: 'doc' }).document).toEqual(doc({ type: 'paragraph' }));
  });

  it('refuses content a node can never hold', () => {
    expect(issuesOf(doc({ type: 'paragraph', content: [{ type: 'paragraph' }] }))[0].path).toBe('document.content.0');
  });
});
