import { describe, expect, it } from 'vitest';
import { templateLeftovers } from '../shared/editor/template-leftovers';
import { STUDY_TEMPLATES } from './index';

describe('templateLeftovers', () => {
  it('finds the guidance and the placeholders every template starts with', () => {
    for (const t of STUDY_TEMPLATES) {
      const found = templateLeftovers(t.document);
      expect(found.guidance, t.key).toBeGreaterThan(0);
      expect(found.placeholders, t.key).toContain('[number]');
    }
  });

  it('finds nothing once they are written over, and ignores brackets that are plain text', () => {
    const written = {
      type: 'doc',
      content: [
        { type: 'paragraph', content: [{ type: 'text', text: 'Guidance: kept as plain text is the author’s choice' }] },
        { type: 'paragraph', content: [{ type: 'text', text: 'Six desks keep the wait near ' }, { type: 'text', text: '4 minutes', marks: [{ type: 'bold' }] }, { type: 'text', text: ' [see table 2].' }] },
      ],
    };
    expect(templateLeftovers(written)).toEqual({ guidance: 0, placeholders: [] });
  });

  it('counts each guidance paragraph, lists each placeholder once, and reads any input safely', () => {
    const para = (...content: object[]) => ({ type: 'paragraph', content });
    const g = para({ type: 'text', text: 'Guidance: ', marks: [{ type: 'italic' }] }, { type: 'text', text: 'say what is in scope.' });
    const p = (text: string) => para({ type: 'text', text, marks: [{ type: 'bold' }] });
    expect(templateLeftovers({ type: 'doc', content: [g, g, p('[Wq]'), p('[Wq]'), p('[ρ]')] })).toEqual({ guidance: 2, placeholders: ['[Wq]', '[ρ]'] });
    for (const junk of [null, 'text', 42, { content: 'x' }]) expect(templateLeftovers(junk)).toEqual({ guidance: 0, placeholders: [] });
  });
});
