/**
 * Object storage that misbehaves, for fault tests: one that accepts connections and never
 * answers (a hung store or a dropped network path), one that answers every request with 500.
 */
import { createServer as createHttpServer } from 'node:http';
import { createServer, type Server as NetServer, type Socket } from 'node:net';

export interface BrokenStorage {
  endpoint: string;
  /** Request lines ("PUT /sojourn/… HTTP/1.1") received so far. */
  requests: string[];
  /** Resolves when a request whose line starts with `prefix` arrives. */
  received(prefix: string, timeoutMs?: number): Promise<string>;
  close(): Promise<void>;
}

function tracker() {
  const requests: string[] = [];
  const waiters: { prefix: string; resolve: (line: string) => void }[] = [];
  return {
    requests,
    seen(line: string): void {
      requests.push(line);
      for (const w of waiters.filter((x) => line.startsWith(x.prefix))) w.resolve(line);
    },
    received(prefix: string, timeoutMs = 30_000): Promise<string> {
      const hit = requests.find((l) => l.startsWith(prefix));
      if (hit) return Promise.resolve(hit);
      return new Promise((resolve, reject) => {
        const timer = setTimeout(() => reject(new Error(`no ${prefix} request within ${timeoutMs} ms (saw: ${requests.join(' | ') || 'nothing'})`)), timeoutMs);
        waiters.push({ prefix, resolve: (l) => (clearTimeout(timer), resolve(l)) });
      });
    },
  };
}

/** Listens on a free loopback port; `dropConnections` ends open connections before closing. */
async function listening(server: NetServer, t: ReturnType<typeof tracker>, dropConnections: () => void): Promise<BrokenStorage> {
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
  const port = (server.address() as { port: number }).port;
  return {
    endpoint: `http://127.0.0.1:${port}`,
    requests: t.requests,
    received: t.received,
    close: () =>
      new Promise<void>((r) => {
        dropConnections();
        server.close(() => r());
      }),
  };
}

/** Accepts TCP, reads the request, never answers. */
export async function silentStorage(): Promise<BrokenStorage> {
  const t = tracker();
  const sockets = new Set<Socket>();
  const server = createServer((socket) => {
    sockets.add(socket);
    socket.on('close', () => sockets.delete(socket));
    socket.on('error', () => undefined);
    let head = '';
    socket.on('data', (b: Buffer) => {
      if (head.includes('\r\n')) return;
      head += b.toString('latin1');
      if (head.includes('\r\n')) t.seen(head.slice(0, head.indexOf('\r\n')));
    });
  });
  return listening(server, t, () => {
    for (const s of sockets) s.destroy();
  });
}

/** Answers every request with an S3-style 500 InternalError. */
export async function failingStorage(): Promise<BrokenStorage> {
  const t = tracker();
  const server = createHttpServer((req, res) => {
    t.seen(`${req.method} ${req.url} HTTP/${req.httpVersion}`);
    req.resume();
    req.on('end', () => {
      res.writeHead(500, { 'content-type': 'application/xml', connection: 'close' });
      res.end('<?xml version="1.0" encoding="UTF-8"?><Error><Code>InternalError</Code><Message>We encountered an internal error. Please try again.</Message></Error>');
    });
  });
  return listening(server, t, () => server.closeAllConnections());
}
