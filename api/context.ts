import { createSessionStore } from './auth/session-store';
import type { Config } from './config';
import { createDb } from './db/client';
import { createMailer } from './mail/mailer';
import { createOutbox } from './mail/outbox';
import { createObjectStorage } from './storage/object-storage';

/** Everything a request handler needs, built once per process and closed on shutdown. */
export function createContext(config: Config) {
  const { db, pool } = createDb(config.databaseUrl);
  const sessionStore = createSessionStore(config.databaseUrl, db, config.sessionCacheMs);
  const storage = createObjectStorage(config.s3);
  const mailer = createMailer(config.smtpUrl, config.mailFrom);
  const outbox = createOutbox(db, mailer);
  return {
    config,
    db,
    pool,
    sessionStore,
    storage,
    mailer,
    outbox,
    async close(): Promise<void> {
      await outbox.stop();
      await sessionStore.close();
      await pool.end();
      mailer.close();
      storage.client.destroy();
    },
  };
}

export type AppContext = ReturnType<typeof createContext>;
