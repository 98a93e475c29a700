import { describe, expect, it } from 'vitest';
import { linkSegments } from './link-segments';

describe('linkSegments', () => {
  it('cuts text around each link', () => {
    const text = 'Join here: http://127.0.0.1:3000/invitations/abc then sign in.';
    expect(linkSegments(text, ['http://127.0.0.1:3000/invitations/abc'])).toEqual([
      { kind: 'text', text: 'Join here: ' },
      { kind: 'link', href: 'http://127.0.0.1:3000/invitations/abc' },
      { kind: 'text', text: ' then sign in.' },
    ]);
  });
  it('prefers the longer link when one is a prefix of another', () => {
    const segs = linkSegments('a http://x.test/reset-password/t1 b', ['http://x.test/', 'http://x.test/reset-password/t1']);
    expect(segs[1]).toEqual({ kind: 'link', href: 'http://x.test/reset-password/t1' });
  });
  it('never turns a script address into a link', () => {
    expect(linkSegments('javascript:alert(1)', ['javascript:alert(1)'])).toEqual([{ kind: 'text', text: 'javascript:alert(1)' }]);
  });
});
