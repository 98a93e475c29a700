import type { ReactNode } from 'react';
import type { BlockConfig, StudyBlockResult } from '#shared/schemas/model-block';
import { BlockResults, modelLabel } from '../../../editor/block-results';
import { withMarks, type Mark } from './reader-marks';

export interface DocNode {
  type?: string;
  text?: string;
  attrs?: Record<string, unknown>;
  marks?: Mark[];
  content?: DocNode[];
}

interface ReaderProps {
  doc: DocNode;
  blocks: Record<string, StudyBlockResult>;
}

/** A model block as the report prints it: its title, then the server's results. */
function ReaderBlock({ attrs, blocks }: { attrs: Record<string, unknown>; blocks: ReaderProps['blocks'] }) {
  const config = attrs.config as BlockConfig | null;
  if (!config?.spec) return null;
  const full: BlockConfig = { ...config, scenarios: config.scenarios ?? [], chart: config.chart ?? null, timeUnit: config.timeUnit ?? 'hour' };
  return (
    <figure className="reader-block model-block my-8 break-inside-avoid">
      <figcaption className="mb-2 font-serif text-base font-bold">{config.title || modelLabel(config.spec.model)}</figcaption>
      <BlockResults config={full} outcome={blocks[String(attrs.blockId)] ?? null} preview={false} />
    </figure>
  );
}

/**
 * Renders stored study JSON as the client reads it, without the editor (so reading loads no
 * TipTap): a node-type map with a fallback that keeps the children of anything unknown.
 */
export function ReaderDocument({ doc, blocks }: ReaderProps) {
  const render = (node: DocNode, key: number | string): ReactNode => {
    const children = () => node.content?.map((c, i) => render(c, i));
    switch (node.type) {
      case 'doc':
        return <div key={key}>{children()}</div>;
      case 'text':
        return <span key={key}>{withMarks(node.text ?? '', node.marks)}</span>;
      case 'paragraph':
        return <p key={key}>{children()}</p>;
      case 'heading': {
        const level = Math.min(3, Math.max(1, Number(node.attrs?.level ?? 1)));
        const Tag = `h${level}` as 'h1' | 'h2' | 'h3';
        return (
          <Tag key={key} id={typeof node.attrs?.sectionId === 'string' ? node.attrs.sectionId : undefined}>
            {children()}
          </Tag>
        );
      }
      case 'bulletList':
        return <ul key={key}>{children()}</ul>;
      case 'orderedList':
        return <ol key={key}>{children()}</ol>;
      case 'listItem':
        return <li key={key}>{children()}</li>;
      case 'blockquote':
        return <blockquote key={key}>{children()}</blockquote>;
      case 'horizontalRule':
        return <hr key={key} />;
      case 'hardBreak':
        return <br key={key} />;
      case 'table':
        return (
          <table key={key}>
            <tbody>{children()}</tbody>
          </table>
        );
      case 'tableRow':
        return <tr key={key}>{children()}</tr>;
      case 'tableHeader':
      case 'tableCell': {
        const Cell = node.type === 'tableHeader' ? 'th' : 'td';
        return (
          <Cell key={key} colSpan={Number(node.attrs?.colspan ?? 1)} rowSpan={Number(node.attrs?.rowspan ?? 1)}>
            {children()}
          </Cell>
        );
      }
      case 'modelBlock':
        return <ReaderBlock key={key} attrs={node.attrs ?? {}} blocks={blocks} />;
      default:
        return <div key={key}>{children()}</div>;
    }
  };
  return <div className="study-text reader-text">{render(doc, 'doc')}</div>;
}
