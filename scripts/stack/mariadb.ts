/**
 * A private MariaDB for development and tests: its own data folder, socket and port on
 * 127.0.0.1, no system service. Installs Debian's package when missing and we are root.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { assertPortFree } from './ports';

const SBIN = ['/usr/sbin', '/usr/bin', '/usr/local/sbin', '/usr/local/bin'];

function findBinary(name: string): string | null {
  for (const dir of [...(process.env.PATH ?? '').split(':'), ...SBIN]) {
    const p = join(dir, name);
    if (dir && existsSync(p)) return p;
  }
  return null;
}

/** Makes sure `mariadbd` exists, installing Debian's mariadb-server as root; explains otherwise. */
export function ensureMariadbInstalled(log: (s: string) => void): void {
  if (findBinary('mariadbd')) return;
  if (process.getuid?.() !== 0) {
    throw new Error(
      'MariaDB is not installed. Install it once with:  sudo apt-get install -y mariadb-server  (then run this command again).',
    );
  }
  log('Installing MariaDB from Debian packages (one time, about 90 s)…');
  aptInstall(['mariadb-server', 'mariadb-client']);
  if (!findBinary('mariadbd')) throw new Error('apt-get finished but mariadbd is still missing.');
}

/** apt-get install as root, with one `apt-get update` first. */
export function aptInstall(packages: string[]): void {
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const update = spawnSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  if (update.status !== 0) throw new Error('apt-get update failed; see the output above.');
  const install = spawnSync('apt-get', ['install', '-y', '-qq', ...packages], { stdio: 'inherit', env });
  if (install.status !== 0) throw new Error(`apt-get install ${packages.join(' ')} failed; see the output above.`);
}

export interface MariadbHandle {
  socket: string;
  port: number;
  stop(): Promise<void>;
}

function run(bin: string, args: string[], input?: string): { ok: boolean; out: string } {
  const r = spawnSync(bin, args, { input, encoding: 'utf8' });
  return { ok: r.status === 0, out: `${r.stdout ?? ''}${r.stderr ?? ''}` };
}

function tail(file: string): string {
  try {
    return readFileSync(file, 'utf8').split('\n').slice(-15).join('\n');
  } catch {
    return '(no error log)';
  }
}

/** Starts mariadbd on 127.0.0.1:port with its data in dataDir; resolves once it answers. */
export async function startMariadb(dataDir: string, port: number): Promise<MariadbHandle> {
  const data = join(dataDir, 'mariadb');
  const runDir = join(dataDir, 'run');
  mkdirSync(runDir, { recursive: true });
  const socket = join(runDir, 'mariadb.sock');
  const errLog = join(runDir, 'mariadb.err');
  const asRoot = process.getuid?.() === 0 ? ['--user=root'] : [];
  if (!existsSync(join(data, 'mysql'))) {
    mkdirSync(data, { recursive: true });
    const init = run(findBinary('mariadb-install-db') ?? 'mariadb-install-db', [
      '--no-defaults', ...asRoot, `--datadir=${data}`, '--auth-root-authentication-method=normal', '--skip-test-db',
    ]);
    if (!init.ok) throw new Error(`mariadb-install-db failed:\n${init.out}`);
  }
  await assertPortFree(port, 'MariaDB (DB_PORT)');
  const child: ChildProcess = spawn(
    findBinary('mariadbd') ?? 'mariadbd',
    [
      '--no-defaults', ...asRoot, `--datadir=${data}`, `--socket=${socket}`, `--pid-file=${join(runDir, 'mariadb.pid')}`,
      `--port=${port}`, '--bind-address=127.0.0.1', '--skip-name-resolve', `--log-error=${errLog}`,
      '--character-set-server=utf8mb4', '--collation-server=utf8mb4_unicode_ci', '--max-connections=500',
    ],
    { stdio: 'ignore' },
  );
  let exited = false;
  child.on('exit', () => (exited = true));
  const admin = findBinary('mariadb-admin') ?? 'mariadb-admin';
  const deadline = Date.now() + 30_000;
  while (!run(admin, ['--no-defaults', `--socket=${socket}`, '-uroot', 'ping']).ok) {
    if (exited || Date.now() > deadline) {
      throw new Error(`MariaDB did not start (port ${port}). Last lines of ${errLog}:\n${tail(errLog)}`);
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  return {
    socket,
    port,
    async stop() {
      if (exited) return;
      run(admin, ['--no-defaults', `--socket=${socket}`, '-uroot', 'shutdown']);
      const until = Date.now() + 15_000;
      while (!exited && Date.now() < until) await new Promise((r) => setTimeout(r, 100));
      if (!exited) child.kill('SIGKILL');
    },
  };
}

/** Creates the database and an application user (password required: drizzle-kit rejects empty ones). */
export function ensureDatabase(
  socket: string,
  opts: { database: string; user: string; password: string; allDatabases?: boolean },
): void {
  const scope = opts.allDatabases ? '*.*' : `\`${opts.database}\`.*`;
  const sql = [
    `CREATE DATABASE IF NOT EXISTS \`${opts.database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
    `CREATE USER IF NOT EXISTS '${opts.user}'@'127.0.0.1' IDENTIFIED BY '${opts.password}';`,
    `ALTER USER '${opts.user}'@'127.0.0.1' IDENTIFIED BY '${opts.password}';`,
    `GRANT ALL PRIVILEGES ON ${scope} TO '${opts.user}'@'127.0.0.1';`,
    'FLUSH PRIVILEGES;',
  ].join('\n');
  const r = run(findBinary('mariadb') ?? 'mariadb', ['--no-defaults', `--socket=${socket}`, '-uroot'], sql);
  if (!r.ok) throw new Error(`Could not create the database or its user:\n${r.out}`);
}
