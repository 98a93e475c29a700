// Plain Node (no dependencies): runs before node_modules exists on a fresh clone.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const root = join(dirname(fileURLToPath(import.meta.url)), '..');

/** `npm ci` when node_modules is missing or older than package-lock.json. */
export function ensureDependencies() {
  const marker = join(root, 'node_modules', '.package-lock.json');
  const lock = join(root, 'package-lock.json');
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return;
  console.log('[sojourn] Installing npm dependencies (npm ci)…');
  const r = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (r.status !== 0) {
    console.error('[sojourn] npm ci failed; see the output above.');
    process.exit(r.status ?? 1);
  }
}

/**
 * Runs a TypeScript entry with tsx in a child process. The terminal's Ctrl-C reaches the child
 * too, which tears its services down; this parent only waits and passes the exit code on.
 */
export function runTs(entry, args = []) {
  const child = spawn(process.execPath, ['--import', 'tsx', join(root, entry), ...args], { cwd: root, stdio: 'inherit' });
  const forward = (sig) => child.kill(sig);
  process.on('SIGINT', () => {});
  process.on('SIGTERM', forward);
  child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
}
