import { describe, expect, it } from 'vitest';
import { blockConfigs, issuesByBlock } from './document-blocks';

const doc = {
  type: 'doc',
  content: [
    { type: 'heading', attrs: { level: 1, sectionId: 's-1' }, content: [{ type: 'text', text: 'Demand' }] },
    { type: 'paragraph' },
    { type: 'modelBlock', attrs: { blockId: 'b-desk', config: { spec: { model: 'M/M/c' } } } },
    { type: 'table', content: [{ type: 'tableRow', content: [{ type: 'tableCell', content: [{ type: 'modelBlock', attrs: { blockId: 'b-cell', config: null } }] }] }] },
  ],
};

describe('blockConfigs', () => {
  it('finds blocks at any depth with their config as JSON', () => {
    expect(blockConfigs(doc)).toEqual({ 'b-desk': '{"spec":{"model":"M/M/c"}}', 'b-cell': 'null' });
  });
});

describe('issuesByBlock', () => {
  it('puts an issue on the block its path names, relative to the config', () => {
    const { byBlock, general } = issuesByBlock(doc, [{ path: 'document.content.2.attrs.config.spec.servers', message: 'must be at least 1' }]);
    expect(byBlock).toEqual({ 'b-desk': [{ path: 'spec.servers', message: 'must be at least 1' }] });
    expect(general).toEqual([]);
  });

  it('follows nested content (a block inside a table cell)', () => {
    const { byBlock } = issuesByBlock(doc, [{ path: 'document.content.3.content.0.content.0.content.0.attrs.config.title', message: 'too long' }]);
    expect(byBlock['b-cell']).toEqual([{ path: 'title', message: 'too long' }]);
  });

  it('keeps issues that name no block as general', () => {
    const { general } = issuesByBlock(doc, [{ path: 'title', message: 'Enter a title' }, { path: 'document.content.0.attrs.level', message: 'bad' }]);
    expect(general).toHaveLength(2);
  });
});
