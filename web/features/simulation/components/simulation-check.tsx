import { useEffect, useId, useMemo, useRef, useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { compareWithAnalytic } from '#shared/queue/sim/from-spec-comparison';
import type { SimulationJobRequest } from '#shared/queue/sim/from-spec-job';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-error';
import { simulationJobQuery } from '../api/simulation-job-query';
import { useCancelSimulation, useStartSimulation } from '../api/simulation-mutations';
import { SimulationProgress } from './simulation-progress';
import { SimulationResult } from './simulation-result';

export interface SimulationCheckProps {
  /** The model block's resolved engine spec: numbers only (assumption links already replaced), engine time unit. */
  spec: SimulationJobRequest['spec'];
  /** The engine's result for that spec, in the same time unit (a ModelResult, or any record of its measures). */
  analytic: Parameters<typeof compareWithAnalytic>[0];
}

interface Run {
  id: string;
  /** The spec the run was started with, so a result for older inputs is never shown as current. */
  specKey: string;
  seed: number;
}

function errorText(err: unknown): string {
  if (!isApiError(err)) return 'The check could not be started.';
  const fields = err.issues.filter((i) => i.path).map((i) => `${i.path}: ${i.message}`);
  return fields.length > 0 ? `${err.message} (${fields.join('; ')})` : err.message;
}

/**
 * Optional cross-check of a model block: simulates the same queue on the server, shows progress,
 * can be cancelled, and says per measure whether the formula value lies inside the simulated 95 %
 * confidence interval. Focus moves only when it was inside this panel (or lost with a button that
 * went away), so someone who keeps writing while the check runs is never pulled back.
 */
export function SimulationCheck({ spec, analytic }: SimulationCheckProps) {
  const specKey = JSON.stringify(spec);
  const [run, setRun] = useState<Run | null>(null);
  const start = useStartSimulation();
  const cancel = useCancelSimulation();
  const { data: job, error: pollError } = useQuery(simulationJobQuery(run?.id ?? null));
  const panel = useRef<HTMLElement>(null);
  const headingId = useId();
  const resultId = useId();

  const current = run !== null && run.specKey === specKey;
  const status = current ? job?.status : undefined;
  const running = start.isPending || status === 'running';
  const result = current && status === 'done' ? job?.result : undefined;
  const comparison = useMemo(() => (result ? compareWithAnalytic(analytic, result) : null), [analytic, result]);

  const previous = useRef(status);
  useEffect(() => {
    const was = previous.current;
    previous.current = status;
    const root = panel.current;
    const active = document.activeElement;
    if (!root || was === status || !(active === document.body || root.contains(active))) return;
    const target =
      status === 'running' ? root.querySelector<HTMLElement>('[data-focus="cancel"]')
      : status === 'done' ? document.getElementById(resultId)
      : root.querySelector<HTMLElement>('[data-focus="run"]');
    target?.focus();
  }, [status, resultId]);

  const onRun = (): void => {
    // A rerun of the same inputs takes a new seed, so it adds evidence instead of repeating the figures.
    const seed = current ? run.seed + 1 : 1;
    start.mutate({ spec, seed }, { onSuccess: (started) => setRun({ id: started.id, specKey, seed }) });
  };

  return (
    <section ref={panel} aria-labelledby={headingId} className="space-y-3 rounded-lg border border-rule bg-sheet p-4">
      <h3 id={headingId} className="font-serif text-base">
        Simulation check
      </h3>
      <p className="text-sm text-ink-soft">
        Simulates the same queue on the server and tests whether each formula value falls inside the simulated 95 % confidence interval. It takes a few
        seconds.
      </p>

      <div className="flex flex-wrap items-center gap-3">
        {running ? (
          <>
            <SimulationProgress fraction={status === 'running' ? (job?.progress ?? 0) : 0} />
            <Button data-focus="cancel" onClick={() => run && cancel.mutate(run.id)} busy={cancel.isPending} disabled={!run || status !== 'running'}>
              Cancel
            </Button>
          </>
        ) : (
          <Button data-focus="run" variant="primary" onClick={onRun}>
            {result ? 'Run again with a new seed' : 'Run a simulation check'}
          </Button>
        )}
      </div>

      <div aria-live="polite" className="space-y-3">
        {run !== null && !current && <p className="text-sm text-ink-soft">The inputs changed since the last check, so its figures no longer apply.</p>}
        {current && status === 'cancelled' && <p className="text-sm text-ink-soft">The check was cancelled; nothing was kept.</p>}
      </div>
      {start.isError && <Banner tone="danger" title="The check did not start">{errorText(start.error)}</Banner>}
      {cancel.isError && <Banner tone="danger" title="The check could not be cancelled">{errorText(cancel.error)}</Banner>}
      {current && status === 'failed' && <Banner tone="danger" title="The check failed">{job?.error?.message ?? 'The simulation ended without a result.'}</Banner>}
      {current && pollError && (
        <Banner tone="warn" title="The check is no longer available">
          {isApiError(pollError) && pollError.status === 404 ? 'The server keeps a check for ten minutes; run it again.' : errorText(pollError)}
        </Banner>
      )}
      {result && comparison && <SimulationResult result={result} comparison={comparison} headingId={resultId} />}
    </section>
  );
}
