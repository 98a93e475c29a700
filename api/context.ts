import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import type { Config } from './config';
import { createDb } from './db/client';
import { createMailer } from './mail/mailer';
import { createOutbox } from './mail/outbox';
import { createObjectStorage } from './storage/object-storage';

/** Everything a request handler needs, built once per process and closed on shutdown. */
export function createContext(config: Config) {
  const { db, pool } = createDb(config.databaseUrl);
  const url = new URL(config.databaseUrl);
  const MySQLStore = MySQLStoreFactory(session);
  // express-mysql-session bundles its own mysql2, so it gets connection options, not our pool.
  const sessionStore = new MySQLStore({
    host: url.hostname,
    port: Number(url.port || 3306),
    user: decodeURIComponent(url.username),
    password: decodeURIComponent(url.password),
    database: url.pathname.slice(1),
    createDatabaseTable: false,
    clearExpired: true,
    checkExpirationInterval: 15 * 60_000,
    schema: { tableName: 'sessions', columnNames: { session_id: 'session_id', expires: 'expires', data: 'data' } },
  });
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
