/** Builders for the warnings results carry, so the same situation is worded the same everywhere. */
import { HEAVY_TRAFFIC, HIGH_UTILISATION } from './limits';
import type { QueueWarning } from './result';

const pct = (x: number): string => `${(100 * x).toFixed(1)} %`;

/** Warnings for an offered utilisation ρ: above 85 % waiting is fragile, above 95 % very much so. */
export function utilisationWarnings(rho: number): QueueWarning[] {
  const out: QueueWarning[] = [];
  if (rho >= HEAVY_TRAFFIC && rho < 1) {
    out.push({
      code: 'heavy_traffic',
      message: `Utilisation ${pct(rho)} is in heavy traffic: a small rise in demand changes waiting times a great deal.`,
    });
  } else if (rho > HIGH_UTILISATION && rho < 1) {
    out.push({
      code: 'high_utilisation',
      message: `Utilisation ${pct(rho)} is above ${pct(HIGH_UTILISATION)}: waiting is sensitive to small changes in demand.`,
    });
  }
  return out;
}

export function approximationWarning(what: string): QueueWarning {
  return { code: 'approximation', message: `${what} is an approximation, not an exact result.` };
}

/** Finite-room or abandonment models may be offered more than their servers can carry. */
export function overloadWarning(rho: number): QueueWarning[] {
  if (rho < 1) return [];
  return [
    {
      code: 'overloaded',
      message: `Offered utilisation ${pct(rho)} is at or above 100 %: the model stays finite only because customers are turned away or leave.`,
    },
  ];
}

export function highShareWarning(code: 'high_blocking' | 'high_abandonment', share: number, limit = 0.05): QueueWarning[] {
  if (!(share > limit)) return [];
  const what = code === 'high_blocking' ? 'are blocked' : 'abandon';
  return [{ code, message: `${pct(share)} of arriving customers ${what}.` }];
}
