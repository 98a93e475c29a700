import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

function newestMtime(dir: string): number {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestMtime(p) : statSync(p).mtimeMs);
  }
  return newest;
}

/** Builds the web app with Vite unless dist/web is newer than every source it depends on. */
export function buildWebIfStale(root: string, log: (s: string) => void, force = false): string {
  const dist = join(root, 'dist', 'web');
  const index = join(dist, 'index.html');
  const sources = Math.max(newestMtime(join(root, 'web')), newestMtime(join(root, 'shared')), statSync(join(root, 'vite.config.ts')).mtimeMs);
  if (!force && existsSync(index) && statSync(index).mtimeMs > sources) return dist;
  log('Building the web app…');
  const r = spawnSync(process.execPath, [join(root, 'node_modules', 'vite', 'bin', 'vite.js'), 'build', '--logLevel', 'warn'], {
    cwd: root,
    stdio: 'inherit',
  });
  if (r.status !== 0) throw new Error('The web build failed; see the output above.');
  return dist;
}
