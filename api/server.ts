import { ConfigError, loadConfig } from './config';
import { createApp } from './app';
import { createContext } from './context';
import { createReleaseSweeper } from './routes/revisions/release-sweeper';

/** Production entry: configuration from the environment, nothing else started. */
let config;
try {
  config = loadConfig();
} catch (err) {
  if (err instanceof ConfigError) {
    console.error(err.message);
    process.exit(1);
  }
  throw err;
}
const ctx = createContext(config);
const app = createApp(ctx);
ctx.outbox.start();
// Releases whose process died mid-way are recorded as interrupted (failed), at start and then periodically.
const releaseSweeper = createReleaseSweeper(ctx);
releaseSweeper.start();
const host = process.env.HOST ?? '127.0.0.1';
const server = app.listen(config.port, host);
server.on('listening', () => console.log(`[api] listening on http://${host}:${config.port}`));
server.on('error', (err: NodeJS.ErrnoException) => {
  console.error(err.code === 'EADDRINUSE' ? `Port ${config.port} (PORT) is already taken by another program.` : err.message);
  process.exit(1);
});

const shutdown = (): void => {
  server.close(() => {
    void releaseSweeper
      .stop()
      .then(() => ctx.close())
      .finally(() => process.exit(0));
  });
  setTimeout(() => process.exit(0), 5_000).unref();
};
process.on('SIGTERM', shutdown);
process.on('SIGINT', shutdown);
