/**
 * The product on this machine: private MariaDB in .data/, fakes, built web app, one Express
 * process. Ctrl-C stops everything it started (MariaDB with mariadb-admin shutdown).
 */
import { spawn } from 'node:child_process';
import { join, resolve } from 'node:path';
import { DEMO_USERS } from '../../fakes/demo-seed';
import { bootStack } from './boot-stack';
import { assertPortFree } from './ports';
import { localSecrets } from './secrets';
import { buildWebIfStale } from './web-build';
import { waitForHttp } from './wait-http';
import { SERVER_NODE_ARGS } from './server-args';

const root = resolve(import.meta.dirname, '../..');
const env = process.env;
const log = (s: string): void => console.log(`[sojourn] ${s}`);
const num = (v: string | undefined, d: number): number => (v ? Number(v) : d);
const dev = process.argv.includes('--dev');

const t0 = Date.now();
const dataDir = resolve(root, env.SOJOURN_DATA_DIR ?? '.data');
const secrets = localSecrets(dataDir);
const port = num(env.PORT, 3000);
const demoPassword = env.DEMO_PASSWORD ?? 'sojourn-demo';

let stack: Awaited<ReturnType<typeof bootStack>> | null = null;
try {
  await assertPortFree(port, 'the app (PORT)');
  stack = await bootStack({
    dataDir,
    dbPort: num(env.DB_PORT, 3307),
    s3Port: num(env.S3_PORT, 4569),
    smtpPort: num(env.SMTP_PORT, 2525),
    mailFakePort: num(env.MAIL_FAKE_PORT, 2526),
    dbPassword: secrets.dbPassword,
    demoPassword,
    log,
  });
  const webDist = dev ? '' : buildWebIfStale(root, log);
  const publicUrl = env.PUBLIC_URL ?? `http://localhost:${dev ? 5173 : port}`;
  const serverEnv = { ...env, ...stack.env, PORT: String(port), PUBLIC_URL: publicUrl, SESSION_SECRET: secrets.sessionSecret, WEB_DIST: webDist };
  const api = spawn(process.execPath, [...SERVER_NODE_ARGS, ...(dev ? ['watch'] : []), join(root, 'api/server.ts')], {
    cwd: root,
    env: serverEnv,
    stdio: 'inherit',
  });
  const children = [api];
  if (dev) children.push(spawn(process.execPath, [join(root, 'node_modules/vite/bin/vite.js')], { cwd: root, env: serverEnv, stdio: 'inherit' }));

  let stopping = false;
  const stopAll = async (code: number): Promise<never> => {
    if (!stopping) {
      stopping = true;
      log('Stopping…');
      for (const c of children) c.kill('SIGTERM');
      await new Promise((r) => setTimeout(r, 300));
      await stack?.stop();
      log('Stopped.');
    }
    process.exit(code);
  };
  process.on('SIGINT', () => void stopAll(0));
  process.on('SIGTERM', () => void stopAll(0));
  api.on('exit', (code) => {
    if (!stopping) {
      log(`The app process ended (exit ${code}); stopping the services.`);
      void stopAll(code || 1);
    }
  });

  await waitForHttp(`http://127.0.0.1:${port}/api/health`);
  log(`Ready in ${((Date.now() - t0) / 1000).toFixed(1)} s — open ${publicUrl}`);
  log(`Demo sign-ins (password "${demoPassword}"):`);
  for (const u of DEMO_USERS.filter((x) => !/\d@/.test(x.email))) log(`  ${u.role.padEnd(10)} ${u.email}`);
  log('Mail sent by the app is caught locally: sign in as admin and open Mailbox. Ctrl-C stops everything.');
} catch (err) {
  console.error(`[sojourn] Could not start: ${(err as Error).message}`);
  await stack?.stop();
  process.exit(1);
}
