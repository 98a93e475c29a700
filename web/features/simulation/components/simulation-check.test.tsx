// @vitest-environment happy-dom
import { act } from 'react';
import { createRoot, type Root } from 'react-dom/client';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { SimulationCheck } from './simulation-check';

(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;

const spec = { model: 'M/M/1', arrivalRate: 2, serviceRate: 3 };
// source: Hillier & Lieberman worked example, λ = 2, μ = 3 (from memory): Wq = 2/3, L = 2.
const analytic = { Wq: 2 / 3, L: 2, method: { exact: true } };
const est = (mean: number, halfWidth: number) => ({ mean, lower: mean - halfWidth, upper: mean + halfWidth, halfWidth, samples: 10 });
const result = {
  model: 'M/M/1', method: 'replications', seed: 1, horizonUnit: 'customers', horizon: 136_363, warmup: 13_636, offeredLoad: 2 / 3, rho: 2 / 3,
  estimates: {
    wq: est(0.67, 0.01), w: est(1, 0.01), lq: est(1.33, 0.02), l: est(2.2, 0.03), probWait: est(0.667, 0.002),
    probBlock: est(0, 0), probAbandon: est(0, 0), utilisation: est(0.667, 0.001), throughput: est(2, 0.005),
  },
  customers: 1_363_630, events: 3_000_000, warnings: [],
};
const job = (status: string, progress: number, extra = {}) => ({ job: { id: 'a1', status, progress, startedAt: '2030-01-01T00:00:00.000Z', ...extra } });

let root: Root;
let host: HTMLElement;
let answers: Record<string, () => unknown>;
beforeEach(() => {
  host = document.createElement('div');
  document.body.append(host);
  root = createRoot(host);
  vi.stubGlobal('fetch', vi.fn(async (url: string, init?: RequestInit) => {
    const body = answers[`${init?.method ?? 'GET'} ${url}`]?.();
    return new Response(JSON.stringify(body), { status: body ? 200 : 404, headers: { 'content-type': 'application/json' } });
  }));
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  act(() => root.render(<QueryClientProvider client={client}><SimulationCheck spec={spec} analytic={analytic} /></QueryClientProvider>));
});
afterEach(() => {
  act(() => root.unmount());
  host.remove();
  vi.unstubAllGlobals();
});

const button = (name: RegExp) => [...host.querySelectorAll('button')].find((b) => name.test(b.textContent ?? ''));
async function until(check: () => unknown): Promise<void> {
  for (let i = 0; i < 60; i++) {
    if (check()) return;
    await act(() => new Promise((r) => setTimeout(r, 50)));
  }
  throw new Error(`never happened: ${host.textContent}`);
}

describe('SimulationCheck', () => {
  it('runs a check, shows progress with Cancel focused, then the verdict per measure', async () => {
    let polls = 0;
    answers = {
      'POST /api/simulations': () => job('running', 0),
      'GET /api/simulations/a1': () => (++polls < 2 ? job('running', 0.4) : job('done', 1, { result })),
    };
    button(/Run a simulation check/)!.focus();
    act(() => button(/Run a simulation check/)!.click());
    await until(() => host.querySelector('[role="progressbar"]')?.getAttribute('aria-valuenow') === '40');
    expect(document.activeElement?.textContent).toContain('Cancel');
    await until(() => host.querySelector('table'));
    const rows = [...host.querySelectorAll('tbody tr')].map((r) => r.textContent);
    expect(rows[0]).toContain('inside the interval');
    expect(rows.find((r) => r?.includes('Mean number in system'))).toContain('outside — the formula may not apply here');
    expect(document.activeElement?.textContent).toBe('1 of 2 formula values lie outside their intervals.');
    expect(button(/Run again with a new seed/)).toBeDefined();
  });

  it('cancels a running check and returns focus to the run button', async () => {
    answers = {
      'POST /api/simulations': () => job('running', 0),
      'GET /api/simulations/a1': () => job('running', 0.1),
      'DELETE /api/simulations/a1': () => job('cancelled', 0.1),
    };
    act(() => button(/Run a simulation check/)!.click());
    await until(() => button(/Cancel/) && !button(/Cancel/)!.disabled);
    act(() => button(/Cancel/)!.click());
    await until(() => host.textContent?.includes('The check was cancelled'));
    expect(document.activeElement?.textContent).toBe('Run a simulation check');
  });
});
