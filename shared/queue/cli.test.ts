import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const cli = fileURLToPath(new URL('./cli.ts', import.meta.url));
const run = (input: string, args: string[] = []) =>
  spawnSync(process.execPath, ['--import', 'tsx', cli, ...args], { input, encoding: 'utf8', timeout: 20_000 });

describe('queue CLI', () => {
  it('prints results in order, an error object in place of an invalid spec, and exits 2', () => {
    const out = run(
      JSON.stringify([
        { model: 'M/M/1', arrivalRate: 2, serviceRate: 3 },
        { model: 'M/M/c', arrivalRate: 7, serviceRate: 3, servers: 2 },
        { model: 'M/M/c', arrivalRate: 2, serviceRate: 3, servers: 0 },
      ]),
    );
    expect(out.status).toBe(2);
    const results = JSON.parse(out.stdout);
    expect(results[0]).toMatchObject({ model: 'M/M/1', L: 2 });
    expect(results[1].error).toMatchObject({ code: 'unstable', details: { minServers: 3 } });
    expect(results[2].error).toMatchObject({ code: 'invalid_input', issues: [{ path: 'servers' }] });
  }, 30_000);

  it('prints a single result for a single spec and exits 0', () => {
    const out = run(JSON.stringify({ model: 'M/D/1', arrivalRate: 8, serviceRate: 12 }));
    expect(out.status).toBe(0);
    expect(JSON.parse(out.stdout)).toMatchObject({ model: 'M/D/1', method: { exact: true } });
  }, 30_000);
});
