import type { ApiIssue } from '#shared/api-error';

interface JsonNode {
  type?: string;
  attrs?: Record<string, unknown>;
  content?: JsonNode[];
}

/** Every model block of a document with the JSON of its config, by block id. */
export function blockConfigs(doc: object): Record<string, string> {
  const out: Record<string, string> = {};
  const walk = (node: JsonNode) => {
    if (node.type === 'modelBlock' && typeof node.attrs?.blockId === 'string') out[node.attrs.blockId] = JSON.stringify(node.attrs.config ?? null);
    node.content?.forEach(walk);
  };
  walk(doc as JsonNode);
  return out;
}

/**
 * Places a refused save's issues on the blocks they name. The API reports paths into the sent
 * body ("document.content.3.attrs.config.spec.servers"); the issue is kept with the path inside
 * the block's config ("spec.servers"). Issues that name no block are returned as `general`.
 */
export function issuesByBlock(doc: object, issues: readonly ApiIssue[]): { byBlock: Record<string, ApiIssue[]>; general: ApiIssue[] } {
  const byBlock: Record<string, ApiIssue[]> = {};
  const general: ApiIssue[] = [];
  for (const issue of issues) {
    const parts = issue.path.split('.');
    let node: JsonNode | undefined = parts[0] === 'document' ? (doc as JsonNode) : undefined;
    let i = 1;
    while (node && parts[i] === 'content' && i + 1 < parts.length) {
      node = node.content?.[Number(parts[i + 1])];
      i += 2;
    }
    const blockId = node?.type === 'modelBlock' ? node.attrs?.blockId : undefined;
    if (typeof blockId === 'string' && parts[i] === 'attrs' && parts[i + 1] === 'config') {
      (byBlock[blockId] ??= []).push({ path: parts.slice(i + 2).join('.'), message: issue.message });
    } else general.push(issue);
  }
  return { byBlock, general };
}
