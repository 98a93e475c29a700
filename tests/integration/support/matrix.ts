/** The shared harness of the authorisation matrices: one row per route, one expected status per role. */
import { expect } from 'vitest';
import type { Role } from '../../../shared/schemas/roles';
import type { Agent } from './test-app';

export type Who = Role | 'anonymous';
export const WHO: Who[] = ['admin', 'partner', 'consultant', 'client', 'anonymous'];

export interface MatrixRow {
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  path: () => string;
  body?: () => object;
  expect: Record<Who, number>;
}

/** `it.each` cases named "METHOD path-expression", so a failure names the route. */
export const matrixCases = <R extends MatrixRow>(rows: R[]) =>
  rows.map((r) => [`${r.method.toUpperCase()} ${r.path.toString().replace(/^\(\) => /, '')}`, r] as const);

/** Calls the row's route as `who` and checks the status and that failures carry the one error body. */
export async function expectMatrixAnswer(a: Agent, who: Who, row: MatrixRow): Promise<void> {
  const res = row.method === 'get' || row.method === 'delete' ? await a[row.method](row.path()) : await a[row.method](row.path(), row.body?.());
  expect({ status: res.status, body: res.status >= 400 ? Object.keys(res.body) : 'ok' }).toEqual({
    status: row.expect[who],
    body: row.expect[who] >= 400 ? ['error'] : 'ok',
  });
}
