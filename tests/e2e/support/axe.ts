import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const axePath = createRequire(import.meta.url).resolve('axe-core/axe.min.js');

/** The WCAG 2.0/2.1 A and AA rules: what the accessibility issue asks every screen to pass. */
const TAGS = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'];

export type AxeFinding = { id: string; impact: string; help: string; helpUrl: string; targets: string[] };

type AxeRule = { id: string; impact?: string | null; help: string; helpUrl: string; nodes: { target: unknown[]; failureSummary?: string }[] };
type AxeResult = { violations: AxeRule[]; incomplete: AxeRule[] };

/**
 * Runs axe-core in the page and returns the serious and critical violations, one entry per rule
 * with the offending selectors. `exclude` takes selectors of single nodes that are known false
 * positives; each caller says why next to the selector.
 */
export async function seriousViolations(page: Page, exclude: string[] = []): Promise<AxeFinding[]> {
  if (!(await page.evaluate(() => 'axe' in window))) await page.addScriptTag({ path: axePath });
  const result = await page.evaluate(
    async ({ tags, exclude }) => {
      const axe = (window as unknown as { axe: { run: (ctx: unknown, opts: unknown) => Promise<unknown> } }).axe;
      const context = exclude.length > 0 ? { include: [document], exclude: exclude.map((s) => [s]) } : document;
      return axe.run(context, { runOnly: { type: 'tag', values: tags }, resultTypes: ['violations', 'incomplete'] });
    },
    { tags: TAGS, exclude },
  );
  const { violations, incomplete } = result as AxeResult;
  // A11Y_VERBOSE=1 also lists what the gate lets through: lesser violations and what axe could not decide.
  if (process.env.A11Y_VERBOSE) {
    const line = (kind: string, r: AxeRule) => `  ${kind} ${r.impact ?? '?'} ${r.id} (${r.nodes.length}): ${r.nodes.slice(0, 3).map((n) => n.target.map(String).join(' ')).join(' | ')}`;
    const lesser = violations.filter((v) => v.impact !== 'serious' && v.impact !== 'critical').map((r) => line('violation', r));
    console.log(`[axe] ${page.url()}\n${[...lesser, ...incomplete.map((r) => line('undecided', r))].join('\n') || '  nothing else'}`);
  }
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => ({
      id: v.id,
      impact: v.impact ?? '',
      help: v.help,
      helpUrl: v.helpUrl,
      targets: v.nodes.map((n) => `${n.target.map(String).join(' ')}${n.failureSummary ? ` — ${n.failureSummary.replace(/\s+/g, ' ').slice(0, 200)}` : ''}`),
    }));
}

/** A readable failure message: rule id, what it asks, and every offending node. */
export function describeFindings(screen: string, findings: AxeFinding[]): string {
  return findings
    .map((f) => `[${screen}] ${f.impact} ${f.id}: ${f.help} (${f.helpUrl})\n${f.targets.map((t) => `    ${t}`).join('\n')}`)
    .join('\n');
}
