import { Router } from 'express';
import { compute } from '../../../shared/queue/compute';
import type { ModelResult } from '../../../shared/queue/result';
import { simulationInputFromSpec } from '../../../shared/queue/sim/from-spec';
import { simulationJobRequestSchema } from '../../../shared/queue/sim/from-spec-job';
import { HttpError, notFound } from '../../http-error';
import { currentUser, requireRole } from '../../middleware/auth';
import { parse } from '../../middleware/parse';
import { createSimulationJobs, type SimulationJobsOptions } from './simulation-jobs';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

function jobId(value: string | string[] | undefined): string {
  const s = Array.isArray(value) ? value[0] : value;
  if (!s || !UUID.test(s)) throw notFound('That simulation');
  return s;
}

/**
 * Simulation checks of a model block: POST starts one (202), GET polls it, DELETE cancels it.
 * Not tied to an engagement — the body carries the resolved spec, nothing stored — so the role
 * gate is the access rule; clients read released studies only and never run checks. Jobs are in
 * this process's memory (see simulation-jobs.ts for what that means with several processes).
 */
export function simulationsRouter(options: SimulationJobsOptions = {}): Router {
  const r = Router();
  const jobs = createSimulationJobs(options);
  const staff = requireRole('admin', 'partner', 'consultant');

  r.post('/simulations', staff, (req, res) => {
    const user = currentUser(req);
    const { spec, seed } = parse(simulationJobRequestSchema, req.body);
    // Invalid spec, or a model without a simulation: QueueError → 422 with the engine's issues.
    const input = simulationInputFromSpec(spec, { seed });
    // The authoritative analytic result to compare with; refuses an unstable queue (422) before a worker starts.
    const analytic = compute(spec) as ModelResult;
    const job = jobs.start(user.id, input, analytic);
    if (!job) {
      res.set('Retry-After', '5');
      throw new HttpError(429, 'rate_limited', `This server is already running ${jobs.maxRunning} simulation checks, its limit. Try again in a few seconds.`);
    }
    res.status(202).location(`/api/simulations/${job.id}`).json({ job });
  });

  r.get('/simulations/:id', staff, (req, res) => {
    res.json({ job: jobs.get(currentUser(req).id, jobId(req.params.id)) });
  });

  r.delete('/simulations/:id', staff, (req, res) => {
    res.json({ job: jobs.cancel(currentUser(req).id, jobId(req.params.id)) });
  });

  return r;
}
