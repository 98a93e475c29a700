import { createServer } from 'node:net';

/** Fails with a message naming the service when something already listens on the port. */
export function assertPortFree(port: number, what: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', (err: NodeJS.ErrnoException) =>
      reject(
        new Error(
          err.code === 'EADDRINUSE'
            ? `Port ${port} for ${what} is already taken by another program. Stop it or choose another port.`
            : `Cannot use port ${port} for ${what}: ${err.message}`,
        ),
      ),
    );
    srv.listen(port, '127.0.0.1', () => srv.close(() => resolve()));
  });
}

/** A port the OS says is free right now (for throwaway test stacks). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const addr = srv.address();
      const port = typeof addr === 'object' && addr ? addr.port : 0;
      srv.close(() => resolve(port));
    });
  });
}
