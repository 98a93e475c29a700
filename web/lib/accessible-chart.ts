/**
 * A vega-lite spec whose drawing screen readers meet by name. vega-embed replaces its
 * container's role and label with its own (role "graphics-document", labelled by the spec's
 * `description`, and unlabelled without one), so the words go into the spec. Marks keep vega's
 * own descriptions: `aria: false` would leave their containers as unnamed graphics.
 */
export function accessibleChart<T extends object>(spec: T, description: string): T & { description: string } {
  return { ...spec, description };
}
