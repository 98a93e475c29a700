/** compute(spec): validate an unknown spec and dispatch it to its model or solver. */
import { birthDeath } from './models/birth-death';
import { erlangA } from './models/erlang-a';
import { finiteSource } from './models/finite-source';
import { ggc } from './models/ggc';
import { jackson } from './models/jackson';
import { md1 } from './models/md1';
import { mg1 } from './models/mg1';
import { mm1 } from './models/mm1';
import { mmc } from './models/mmc';
import { mmcc } from './models/mmcc';
import { mmck } from './models/mmck';
import { mminf } from './models/mminf';
import type { QueueResult } from './result';
import { costOptimum } from './solvers/cost-optimum';
import { intervalStaffing } from './solvers/interval-staffing';
import { staffing } from './solvers/staffing';
import { sweep } from './solvers/sweep';
import type { QueueSpec } from './spec';
import { parseSpec } from './validate';

/** Dispatches an already validated spec. */
export function computeParsed(spec: QueueSpec): QueueResult {
  switch (spec.model) {
    case 'M/M/1':
      return mm1(spec);
    case 'M/M/c':
      return mmc(spec);
    case 'M/M/c/K':
      return mmck(spec);
    case 'M/M/c/c':
      return mmcc(spec);
    case 'M/M/inf':
      return mminf(spec);
    case 'M/G/1':
      return mg1(spec);
    case 'M/D/1':
      return md1(spec);
    case 'G/G/c':
      return ggc(spec);
    case 'M/M/c//N':
      return finiteSource(spec);
    case 'M/M/c+M':
      return erlangA(spec);
    case 'birth-death':
      return birthDeath(spec);
    case 'jackson':
      return jackson(spec);
    case 'staffing':
      return staffing(spec);
    case 'cost-optimum':
      return costOptimum(spec);
    case 'interval-staffing':
      return intervalStaffing(spec);
    case 'sweep':
      return sweep(spec, compute);
  }
}

/**
 * Validates `spec` (zod) and computes it. Throws QueueError: 'invalid_input' with every issue and
 * its dotted path, or 'unstable' naming ρ and the capacity stability would need.
 */
export function compute(spec: unknown): QueueResult {
  return computeParsed(parseSpec(spec));
}
