/**
 * The real API server (api/server.ts) as a child process, with the environment of the test
 * stack plus overrides: closer to "a running app" than createApp in the test's own process,
 * and it can be killed outright.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { resolve } from 'node:path';
import { freePort } from '../../../scripts/stack/ports';
import { SERVER_NODE_ARGS } from '../../../scripts/stack/server-args';

const root = resolve(import.meta.dirname, '../../..');

export interface ServerProcess {
  url: string;
  child: ChildProcess;
  /** Everything the server wrote to stdout and stderr (for failure messages). */
  output(): string;
  /** SIGKILL, as a crash or an out-of-memory kill would: no shutdown handlers run. */
  kill(): Promise<void>;
  /** SIGTERM (graceful), SIGKILL after 5 s. */
  stop(): Promise<void>;
}

export async function startServerProcess(env: Record<string, string> = {}): Promise<ServerProcess> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, [...SERVER_NODE_ARGS, resolve(root, 'api/server.ts')], {
    cwd: root,
    env: { ...process.env, PUBLIC_URL: url, WEB_DIST: '', ...env, PORT: String(port), HOST: '127.0.0.1' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  child.stdout.on('data', (b: Buffer) => (out += b.toString()));
  child.stderr.on('data', (b: Buffer) => (out += b.toString()));
  const exited = new Promise<void>((r) => child.once('exit', () => r()));
  let gone = false;
  void exited.then(() => (gone = true));
  const until = async (ms: number): Promise<boolean> => Promise.race([exited.then(() => true), new Promise<boolean>((r) => setTimeout(() => r(false), ms))]);
  // Listening is logged once the server accepts connections.
  const deadline = Date.now() + 30_000;
  while (!out.includes('listening on')) {
    if (gone || Date.now() > deadline) {
      child.kill('SIGKILL');
      throw new Error(`The server did not start:\n${out}`);
    }
    await new Promise((r) => setTimeout(r, 50));
  }
  return {
    url,
    child,
    output: () => out,
    async kill() {
      if (gone) return;
      child.kill('SIGKILL');
      await exited;
    },
    async stop() {
      if (gone) return;
      child.kill('SIGTERM');
      if (!(await until(5_000))) child.kill('SIGKILL');
      await exited;
    },
  };
}
