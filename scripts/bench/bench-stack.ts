/**
 * The running app that the app-level benches (studies PUT, API load) measure, so `npm run bench`
 * needs nothing started beforehand:
 * - SOJOURN_URL set: that app, as it is (DATABASE_URL of its database is needed to seed).
 * - only DATABASE_URL set: an app process of ours against that database.
 * - neither: a throwaway stack as `npm test` makes one (private MariaDB in .test-data/bench-<pid>,
 *   free ports, S3 and SMTP fakes, web build) with the app as a child process.
 * The suites read the addresses (and the pids of the processes we started) from process.env;
 * stop() (also run on Ctrl-C) ends what was started.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { readFileSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { bootStack, type Stack } from '../stack/boot-stack';
import { freePort } from '../stack/ports';
import { waitForHttp } from '../stack/wait-http';
import { buildWebIfStale } from '../stack/web-build';
import { SERVER_NODE_ARGS } from '../stack/server-args';

const root = resolve(import.meta.dirname, '../..');

export interface BenchTarget {
  /** What is measured, for the printed table's footer. */
  describe: string;
  stop(): Promise<void>;
}

/**
 * The app as in production: built web app, NODE_ENV=production, its own port; one process
 * (`npm run serve`) unless BENCH_API_PROCESSES asks for several sharing the port.
 */
async function startApp(env: NodeJS.ProcessEnv, log: (s: string) => void): Promise<{ url: string; child: ChildProcess }> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const processes = Number(env.BENCH_API_PROCESSES ?? 1);
  const entry = processes > 1 ? join(root, 'scripts/bench/app-cluster.ts') : join(root, 'api/server.ts');
  // BENCH_API_NODE_ARGS passes flags to the app's node, e.g. "--cpu-prof --cpu-prof-dir=/tmp/prof".
  const nodeArgs = (env.BENCH_API_NODE_ARGS ?? '').split(' ').filter(Boolean);
  const child = spawn(process.execPath, [...nodeArgs, ...SERVER_NODE_ARGS, entry], {
    cwd: root,
    env: { ...env, PORT: String(port), PUBLIC_URL: url, NODE_ENV: 'production', WEB_DIST: buildWebIfStale(root, log) },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const exited = new Promise<never>((_, reject) => child.once('exit', (code) => reject(new Error(`The app process ended during start (exit ${code}).`))));
  await Promise.race([waitForHttp(`${url}/api/health`), exited]);
  exited.catch(() => undefined);
  return { url, child };
}

async function stopChild(child: ChildProcess | null): Promise<void> {
  if (!child || child.exitCode !== null || child.signalCode !== null) return;
  const gone = new Promise((r) => child.once('exit', r));
  child.kill('SIGTERM');
  await Promise.race([gone, new Promise((r) => setTimeout(r, 6_000))]);
  if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
}

export async function provideRunningApp(log: (s: string) => void): Promise<BenchTarget> {
  if (process.env.SOJOURN_URL) return { describe: `the app at ${process.env.SOJOURN_URL}`, stop: async () => undefined };

  const dataDir = join(root, '.test-data', `bench-${process.pid}`);
  let stack: Stack | null = null;
  let app: ChildProcess | null = null;
  let stopped = false;
  const stop = async (): Promise<void> => {
    if (stopped) return;
    stopped = true;
    await stopChild(app);
    await stack?.stop();
    if (stack) rmSync(dataDir, { recursive: true, force: true });
  };
  const onSignal = (): void => void stop().finally(() => process.exit(130));
  process.once('SIGINT', onSignal);
  process.once('SIGTERM', onSignal);
  try {
    const external = Boolean(process.env.DATABASE_URL);
    if (!external) {
      log('No SOJOURN_URL or DATABASE_URL: starting a throwaway stack…');
      const [dbPort, s3Port, smtpPort, mailFakePort] = await Promise.all([freePort(), freePort(), freePort(), freePort()]);
      stack = await bootStack({ dataDir, dbPort, s3Port, smtpPort, mailFakePort, dbPassword: randomBytes(12).toString('hex'), demoPassword: 'sojourn-demo', log });
      Object.assign(process.env, stack.env, { SOJOURN_DATA_DIR: dataDir });
    }
    const env = {
      S3_BUCKET: 'bench',
      SMTP_URL: 'smtp://127.0.0.1:1',
      ...process.env,
      SESSION_SECRET: process.env.SESSION_SECRET ?? randomBytes(32).toString('hex'),
      // The load bench signs in one session per connection from 127.0.0.1.
      SIGN_IN_LIMIT_PER_ADDRESS: '100000',
    };
    const started = await startApp(env, log);
    app = started.child;
    process.env.SOJOURN_URL = started.url;
    // The API load bench reads these processes' CPU time to tell what the cores could serve alone.
    process.env.BENCH_APP_PID = String(started.child.pid);
    if (stack) process.env.BENCH_DB_PID = readFileSync(join(dataDir, 'run', 'mariadb.pid'), 'utf8').trim();
    log(`App process on ${started.url}${external ? ' against DATABASE_URL' : ''}.`);
    const count = Number(process.env.BENCH_API_PROCESSES ?? 1);
    const processes = `${count} API process${count > 1 ? 'es' : ''}`;
    return { describe: external ? `${processes} against DATABASE_URL` : `a throwaway stack (private MariaDB, ${processes}, NODE_ENV=production)`, stop };
  } catch (err) {
    await stop();
    throw err;
  }
}
