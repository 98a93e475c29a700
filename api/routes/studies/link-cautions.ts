import { MODEL_CATALOG } from '../../../shared/queue/index';
import type { FitWarning } from '../../../shared/queue/fit/index';
import { linkId, type Register } from './resolve-spec';

/** A caution on a block's result that comes from the data behind one of its linked inputs. */
export interface LinkCaution {
  code: `data_${FitWarning['code']}`;
  message: string;
}

/**
 * Models whose formulas take service times to be exponential. Erlang B (M/M/c/c) and M/M/∞ depend
 * on the service time's mean alone; M/G/1 and G/G/c take its SCV; M/D/1 assumes constant service.
 */
const EXPONENTIAL_SERVICE = new Set(['M/M/1', 'M/M/c', 'M/M/c/K', 'M/M/c//N', 'M/M/c+M', 'staffing', 'cost-optimum', 'interval-staffing']);

/** Whether a fit's warning bears on a model's result through the input it feeds. */
function bears(code: FitWarning['code'], model: string, input: string): boolean {
  switch (code) {
    case 'not_exponential':
    case 'exponential_doubtful':
      return input === 'serviceRate' && EXPONENTIAL_SERVICE.has(model);
    case 'variable_demand':
      // A per-interval model takes its rates per interval; a single rate stands for a steady stream.
      return input === 'arrivalRate' && model !== 'interval-staffing';
    case 'small_sample':
      return true;
    default:
      return false;
  }
}

/**
 * The cautions a block's result repeats from the datasets behind its links: design.md asks model
 * blocks to warn where the numbers are fragile, and a fitted value carries its fit's verdict
 * (assumptions.cautions). Each names the input and the assumption, then gives the fit's own words.
 */
export function linkCautions(spec: Record<string, unknown>, register: Register): LinkCaution[] {
  const model = String(spec.model);
  const fields = MODEL_CATALOG.find((e) => e.model === model)?.inputs ?? [];
  const out: LinkCaution[] = [];
  for (const [input, value] of Object.entries(spec)) {
    const id = linkId(value);
    const a = id === null ? undefined : register.get(id);
    for (const w of a?.cautions ?? []) {
      if (!bears(w.code, model, input)) continue;
      const label = fields.find((f) => f.name === input)?.label ?? input;
      out.push({ code: `data_${w.code}`, message: `${label} is linked to "${a!.name}", fitted from data: ${w.message}` });
    }
  }
  return out;
}
