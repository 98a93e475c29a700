/** Documents and blocks for the studies suites: a contact desk modelled with M/M/c. */
export const modelBlock = (blockId: string | undefined, config: Record<string, unknown>) => ({ type: 'modelBlock', attrs: { blockId, config } });

export const deskBlock = (blockId: string, spec: Record<string, unknown> = {}, extra: Record<string, unknown> = {}) =>
  modelBlock(blockId, {
    title: 'Front desk at peak',
    timeUnit: 'hour',
    spec: { model: 'M/M/c', arrivalRate: 30, serviceRate: 12, servers: 3, t: 0.05, ...spec },
    ...extra,
  });

export const heading = (text: string, sectionId?: string) => ({ type: 'heading', attrs: { level: 2, sectionId }, content: [{ type: 'text', text }] });
export const paragraph = (text: string, marks?: unknown[]) => ({ type: 'paragraph', content: [{ type: 'text', text, ...(marks ? { marks } : {}) }] });
export const doc = (...content: unknown[]) => ({ type: 'doc', content });
