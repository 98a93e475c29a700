import { MODEL_CATALOG, type InputField } from '#shared/queue/index';

/** Input kinds a scenario may override or a chart may vary: single numbers. */
const NUMERIC = new Set(['rate', 'duration', 'count', 'probability', 'scv', 'cost', 'number']);

/** The single-number inputs of a model, for scenario overrides and chart parameters. */
export function numericInputs(model: string): InputField[] {
  return (MODEL_CATALOG.find((m) => m.model === model)?.inputs ?? []).filter((f) => NUMERIC.has(f.kind));
}
