import { TIME_UNITS, type TimeUnit } from '#shared/units/units';

interface DocNode {
  type?: string;
  attrs?: { blockId?: unknown; config?: { timeUnit?: unknown } | null };
  content?: unknown[];
}

/**
 * blockId → the block's time unit, from a stored study document (TipTap JSON). Blocks without a
 * readable unit compute in hours, the block schema's default.
 */
export function blockTimeUnits(document: unknown): Record<string, TimeUnit> {
  const out: Record<string, TimeUnit> = {};
  const walk = (node: DocNode) => {
    if (node.type === 'modelBlock' && typeof node.attrs?.blockId === 'string') {
      const unit = node.attrs.config?.timeUnit;
      out[node.attrs.blockId] = (TIME_UNITS as readonly unknown[]).includes(unit) ? (unit as TimeUnit) : 'hour';
    }
    for (const child of node.content ?? []) if (child && typeof child === 'object') walk(child as DocNode);
  };
  if (document && typeof document === 'object') walk(document as DocNode);
  return out;
}
