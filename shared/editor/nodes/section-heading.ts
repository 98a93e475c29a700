import Heading from '@tiptap/extension-heading';

/**
 * Headings are the study's sections (the outline lists them). Each carries a stable `sectionId`
 * so comments and revision comparisons can point at a section even after its title changes.
 */
export const SectionHeading = Heading.extend({
  addAttributes() {
    return {
      ...this.parent?.(),
      sectionId: {
        default: null,
        parseHTML: (el: HTMLElement) => el.getAttribute('data-section-id'),
        renderHTML: (attrs: { sectionId?: string | null }) => (attrs.sectionId ? { 'data-section-id': attrs.sectionId } : {}),
      },
    };
  },
}).configure({ levels: [1, 2, 3] });
