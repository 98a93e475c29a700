/**
 * `npm test`: a throwaway stack (own data folder, free ports), then typecheck, lint and every
 * vitest project (unit, integration, e2e), then tear-down. Exit code is non-zero on any failure.
 */
import { spawn } from 'node:child_process';
import { existsSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { bootStack } from './boot-stack';
import { aptInstall } from './mariadb';
import { freePort } from './ports';
import { buildWebIfStale } from './web-build';
import { waitForHttp } from './wait-http';
import { SERVER_NODE_ARGS } from './server-args';

const root = resolve(import.meta.dirname, '../..');
const log = (s: string): void => console.log(`[test] ${s}`);
const t0 = Date.now();
// `--skip-checks` leaves out typecheck and lint (for quick local runs); the rest goes to vitest.
const skipChecks = process.argv.includes('--skip-checks');
const vitestArgs = process.argv.slice(2).filter((a) => a !== '--skip-checks');

function ensureTestTools(): void {
  const missing = [
    ['/usr/bin/chromium', 'chromium'],
    ['/usr/bin/pdftotext', 'poppler-utils'],
  ].filter(([bin]) => !existsSync(bin!)).map(([, pkg]) => pkg!);
  if (missing.length === 0) return;
  if (process.getuid?.() !== 0) throw new Error(`Install these first: sudo apt-get install -y ${missing.join(' ')}`);
  log(`Installing ${missing.join(', ')} from Debian packages…`);
  aptInstall(missing);
}

/** Runs one check as a child. Asynchronous on purpose: the fakes live in this process and must keep answering. */
async function step(name: string, cmd: string[], env: NodeJS.ProcessEnv = process.env): Promise<boolean> {
  const s = Date.now();
  log(`${name}…`);
  const child = spawn(process.execPath, cmd, { cwd: root, stdio: 'inherit', env });
  const code = await new Promise<number | null>((resolve) => child.on('exit', resolve));
  log(`${name}: ${code === 0 ? 'passed' : 'FAILED'} (${((Date.now() - s) / 1000).toFixed(1)} s)`);
  return code === 0;
}

const dataDir = join(root, '.test-data', `run-${process.pid}`);
let stack: Awaited<ReturnType<typeof bootStack>> | null = null;
let server: ReturnType<typeof spawn> | null = null;
let ok = true;
const cleanup = async (): Promise<void> => {
  server?.kill('SIGTERM');
  await stack?.stop();
  rmSync(dataDir, { recursive: true, force: true });
};
process.on('SIGINT', () => void cleanup().then(() => process.exit(130)));

try {
  ensureTestTools();
  const bin = (p: string): string => join(root, 'node_modules', p);
  if (!skipChecks) {
    ok = (await step('typecheck', [bin('typescript/bin/tsc'), '--noEmit', '-p', 'tsconfig.json'])) && ok;
    ok = (await step('lint', [bin('eslint/bin/eslint.js'), '.', '--max-warnings=0'])) && ok;
  }

  const [dbPort, s3Port, smtpPort, mailFakePort, appPort] = await Promise.all([freePort(), freePort(), freePort(), freePort(), freePort()]);
  const demoPassword = 'sojourn-demo';
  stack = await bootStack({ dataDir, dbPort, s3Port, smtpPort, mailFakePort, dbPassword: 'test-only-password', demoPassword, allDatabases: true, log });
  const webDist = buildWebIfStale(root, log);
  const appUrl = `http://127.0.0.1:${appPort}`;
  const env = {
    ...process.env,
    ...stack.env,
    SESSION_SECRET: 'test-session-secret-that-is-long-enough-0123456789',
    // Browser journeys sign in from 127.0.0.1 many times; the per-address limit has its own test.
    SIGN_IN_LIMIT_PER_ADDRESS: '100000',
    PUBLIC_URL: appUrl,
    SOJOURN_URL: appUrl,
    TEST_DATA_DIR: dataDir,
    NODE_ENV: 'test',
  };
  server = spawn(process.execPath, [...SERVER_NODE_ARGS, join(root, 'api/server.ts')], {
    cwd: root,
    env: { ...env, PORT: String(appPort), WEB_DIST: webDist },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  await waitForHttp(`${appUrl}/api/health`);
  // Projects run one after another: integration and e2e share the database, the SMTP fake (whose
  // outage switch some suites flip) and the app, so running them side by side makes them flaky.
  const runs = vitestArgs.length > 0 ? [vitestArgs] : [['--project', 'unit'], ['--project', 'integration'], ['--project', 'e2e']];
  for (const args of runs) ok = (await step(`vitest ${args.join(' ')}`, [bin('vitest/vitest.mjs'), 'run', ...args], env)) && ok;
} catch (err) {
  console.error(`[test] ${(err as Error).message}`);
  ok = false;
} finally {
  await cleanup();
}
log(`${ok ? 'All passed' : 'FAILED'} in ${((Date.now() - t0) / 1000).toFixed(0)} s`);
process.exit(ok ? 0 : 1);
