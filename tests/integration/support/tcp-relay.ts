/**
 * A switchable TCP path to a real service: while up it forwards every connection to the target,
 * while down nothing listens on its port (connections are refused, as with a relay that is off).
 */
import { connect, createServer, type Server, type Socket } from 'node:net';
import { freePort } from '../../../scripts/stack/ports';

export interface TcpRelay {
  port: number;
  up(): Promise<void>;
  /** Stops listening and cuts open connections. */
  down(): Promise<void>;
}

export async function tcpRelay(target: { host: string; port: number }): Promise<TcpRelay> {
  const port = await freePort();
  let server: Server | null = null;
  const open = new Set<Socket>();
  const track = (s: Socket): void => {
    open.add(s);
    s.on('close', () => open.delete(s));
    s.on('error', () => undefined);
  };
  return {
    port,
    async up() {
      if (server) return;
      const srv = createServer((inbound) => {
        const outbound = connect(target.port, target.host);
        track(inbound);
        track(outbound);
        inbound.pipe(outbound).pipe(inbound);
        inbound.on('close', () => outbound.destroy());
        outbound.on('close', () => inbound.destroy());
      });
      await new Promise<void>((resolve, reject) => srv.once('error', reject).listen(port, '127.0.0.1', () => resolve()));
      server = srv;
    },
    async down() {
      const srv = server;
      server = null;
      for (const s of open) s.destroy();
      if (srv) await new Promise<void>((r) => srv.close(() => r()));
    },
  };
}
