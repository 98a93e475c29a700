import type { ReactNode } from 'react';

export interface Mark {
  type: string;
  attrs?: Record<string, unknown>;
}

/** Only these link targets are ever rendered as links (the server strips others too). */
const SAFE_HREF = /^(https?:|mailto:)/i;

/** Wraps text in its marks: bold, italic, strike, underline, link. Unknown marks leave the text plain. */
export function withMarks(text: ReactNode, marks: readonly Mark[] = []): ReactNode {
  return marks.reduce<ReactNode>((inner, mark) => {
    switch (mark.type) {
      case 'bold':
        return <strong>{inner}</strong>;
      case 'italic':
        return <em>{inner}</em>;
      case 'strike':
        return <s>{inner}</s>;
      case 'underline':
        return <u>{inner}</u>;
      case 'link': {
        const href = String(mark.attrs?.href ?? '');
        return SAFE_HREF.test(href) ? (
          <a href={href} rel="noopener noreferrer nofollow" target="_blank">
            {inner}
          </a>
        ) : (
          inner
        );
      }
      default:
        return inner;
    }
  }, text);
}
