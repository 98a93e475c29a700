/**
 * Public API of the analytic queueing engine (pure TypeScript, no I/O; bundled in the browser).
 * `compute(spec)` validates any spec and dispatches it; the model functions can be called
 * directly with already validated inputs.
 */
export const ENGINE_VERSION = '1.0.0';

export { compute, computeParsed } from './compute';
export { parseSpec, queueErrorFromZod } from './validate';
export { QueueError, invalidInput, unstable, type QueueErrorCode, type QueueErrorDetails, type QueueIssue } from './errors';
export * from './limits';
export * from './spec';
export type * from './result';
export { inputKind, MODEL_CATALOG, type FieldKind, type InputField, type MeasureField, type ModelCatalogEntry } from './catalog';

export { mm1 } from './models/mm1';
export { mmc, mmcMeasures } from './models/mmc';
export { mmck } from './models/mmck';
export { mmcc } from './models/mmcc';
export { mminf } from './models/mminf';
export { mg1 } from './models/mg1';
export { md1 } from './models/md1';
export { ggc } from './models/ggc';
export { finiteSource } from './models/finite-source';
export { erlangA } from './models/erlang-a';
export { birthDeath } from './models/birth-death';
export { jackson, trafficEquations } from './models/jackson';
export { staffing, minimumServers, type StaffingProblem } from './solvers/staffing';
export { costOptimum } from './solvers/cost-optimum';
export { intervalStaffing } from './solvers/interval-staffing';
export { sweep, sweepValues } from './solvers/sweep';
export { erlangB, erlangC } from './numeric/erlang-b';
export { poissonPmf, logPoissonPmf } from './numeric/poisson';
