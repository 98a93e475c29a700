import type { Extensions } from '@tiptap/core';
import StarterKit from '@tiptap/starter-kit';
import { TableKit } from '@tiptap/extension-table';
import { ModelBlock } from './nodes/model-block';
import { SectionHeading } from './nodes/section-heading';

/** Link targets a study may hold; anything else (javascript:, data:) is dropped. */
export const ALLOWED_LINK_PROTOCOLS = ['http', 'https', 'mailto'];

/**
 * The one list of extensions that defines a study document. The server builds its schema from
 * it to validate every save; the web editor uses the same list (with React views added).
 */
export function studyExtensions(overrides: { modelBlock?: typeof ModelBlock } = {}): Extensions {
  return [
    StarterKit.configure({
      heading: false,
      codeBlock: false,
      code: false,
      link: { openOnClick: false, autolink: true, protocols: ALLOWED_LINK_PROTOCOLS, defaultProtocol: 'https' },
    }),
    SectionHeading,
    TableKit.configure({ table: { resizable: false } }),
    overrides.modelBlock ?? ModelBlock,
  ];
}
