import { useMemo, useRef, useState } from 'react';
import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { isAssumptionLink, type BlockConfig } from '#shared/schemas/model-block';
import { Button } from '../components/ui/button';
import { useBlockEnvironment } from './block-environment';
import { BlockEditPanel } from './block-edit-panel';
import { previewBlock } from './block-preview';
import { BlockResults, modelLabel } from './block-results';
import { freshBlocks } from './fresh-blocks';
import { SimulationCheck } from '../features/simulation/components/simulation-check';

/** Models the server-side simulator can run (see shared/queue/sim/from-spec.ts). */
const SIMULATED_MODELS = new Set(['M/M/1', 'M/M/c', 'M/M/c/K', 'M/M/c/c', 'M/M/c+M', 'M/G/1', 'M/D/1', 'G/G/c']);

/**
 * The block's config with defaults filled in, or null when the attribute has no spec. Not a zod
 * parse: that would trim a title mid-typing or reject an option whose name is being retyped; the
 * server validates on save and its refusals land on the fields.
 */
function readConfig(raw: unknown): BlockConfig | null {
  if (typeof raw !== 'object' || raw === null) return null;
  const c = raw as Partial<BlockConfig>;
  if (typeof c.spec !== 'object' || c.spec === null || typeof c.spec.model !== 'string') return null;
  return { title: c.title ?? '', timeUnit: c.timeUnit ?? 'hour', spec: c.spec, scenarios: c.scenarios ?? [], chart: c.chart ?? null, shownMeasures: c.shownMeasures };
}

/**
 * A model block inside the study: compact, it reads like the report (title, results table,
 * method, cautions, chart); "Edit block" (or Enter on it) opens its settings below, Escape
 * closes them and returns focus to the button. Until the server has computed the current
 * settings, the browser's own result is shown and marked as a preview.
 */
export function ModelBlockView({ node, updateAttributes, deleteNode, selected }: ReactNodeViewProps) {
  const env = useBlockEnvironment();
  const blockId = String(node.attrs.blockId ?? '');
  const config = readConfig(node.attrs.config);
  const [editing, setEditing] = useState(() => freshBlocks.delete(blockId));
  const editButton = useRef<HTMLSpanElement>(null);

  const configJson = JSON.stringify(node.attrs.config ?? null);
  const server = env.results[blockId];
  const confirmed = !!server && env.confirmedConfigs[blockId] === configJson;
  const waitingForRegister = env.assumptionsStatus === 'pending' && !!config && Object.values(config.spec).some(isAssumptionLink);
  const preview = useMemo(
    () => (config && !confirmed && !waitingForRegister ? previewBlock(config, env.assumptions) : null),
    // configJson stands for config (a new object every render).
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [configJson, confirmed, waitingForRegister, env.assumptions],
  );
  const outcome = confirmed || !preview ? (server ?? null) : preview;

  const fieldErrors: Record<string, string> = {};
  for (const issue of env.saveIssues[blockId] ?? []) {
    const [head, name] = issue.path.split('.');
    if (head === 'spec' && name) fieldErrors[name] ??= issue.message;
  }
  if (!confirmed && preview?.error) for (const issue of preview.error.issues) fieldErrors[issue.path.split('.')[0]] ??= issue.message;

  const close = () => {
    setEditing(false);
    requestAnimationFrame(() => editButton.current?.querySelector('button')?.focus());
  };

  return (
    <NodeViewWrapper
      as="section"
      contentEditable={false}
      aria-label={`Model block: ${config?.title || (config ? modelLabel(config.spec.model) : 'not set up')}`}
      className={`model-block my-6 rounded-lg border bg-sheet px-5 py-4 ${selected ? 'border-accent ring-2 ring-accent/30' : 'border-rule'}`}
    >
      <header className="mb-3 flex flex-wrap items-baseline justify-between gap-2 font-sans">
        <div className="min-w-0">
          <p className="text-xs font-semibold tracking-widest text-ink-faint uppercase">{config ? modelLabel(config.spec.model) : 'Model block'}</p>
          <h4 className="font-serif text-base font-bold text-ink">{config?.title || 'Untitled calculation'}</h4>
        </div>
        {env.editable && config && (
          <div className="flex gap-2">
            {editing && (
              <Button size="sm" variant="danger" onClick={() => deleteNode()}>
                Remove block
              </Button>
            )}
            <span ref={editButton}>
              <Button size="sm" variant={editing ? 'secondary' : 'quiet'} aria-expanded={editing} data-block-edit onClick={() => (editing ? close() : setEditing(true))}>
                {editing ? 'Close settings' : 'Edit block'}
              </Button>
            </span>
          </div>
        )}
      </header>
      {config ? (
        <BlockResults
          config={config}
          outcome={outcome}
          preview={!confirmed && outcome !== null}
          // Offered only on results the server confirmed: the check simulates exactly what it computed.
          crossCheck={
            env.editable && confirmed && server?.status === 'ok' && server.resolvedSpec && server.result && SIMULATED_MODELS.has(config.spec.model) ? (
              <details className="mt-3 font-sans text-sm">
                <summary className="cursor-pointer text-ink-soft">Check these figures by simulation</summary>
                <SimulationCheck spec={server.resolvedSpec as Parameters<typeof SimulationCheck>[0]['spec']} analytic={server.result as Parameters<typeof SimulationCheck>[0]['analytic']} />
              </details>
            ) : null
          }
        />
      ) : (
        <p className="font-sans text-sm text-danger">This block’s settings could not be read. Remove it and insert a new one.</p>
      )}
      {editing && config && <BlockEditPanel config={config} fieldErrors={fieldErrors} onChange={(next) => updateAttributes({ config: next })} onClose={close} />}
    </NodeViewWrapper>
  );
}
