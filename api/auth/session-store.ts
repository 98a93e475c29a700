import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';

/**
 * A rolling session would otherwise write its new expiry to MariaDB on every request (one
 * UPDATE and one redo-log flush per API call, most of the database's work under load). Once per
 * minute per session is enough for a 12-hour lifetime: the stored expiry then trails the cookie
 * by at most two minutes. Reading, signing out and deactivation still go to the database every time,
 * so a destroyed session is refused by every process at its next request.
 */
export const TOUCH_EVERY_MS = 60_000;

export function createSessionStore(databaseUrl: string): InstanceType<ReturnType<typeof MySQLStoreFactory>> {
  const url = new URL(databaseUrl);
  const MySQLStore = MySQLStoreFactory(session);
  // express-mysql-session bundles its own mysql2, so it gets connection options, not our pool.
  const store = new MySQLStore({
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
  // Two generations of "touched recently": ids move out after one to two minutes, so memory
  // stays bounded by the sessions active in that time.
  let recent = new Set<string>();
  let older = new Set<string>();
  let turnedAt = Date.now();
  const touch = store.touch.bind(store);
  store.touch = ((sid: string, data: session.SessionData, callback?: (err?: unknown) => void) => {
    const now = Date.now();
    if (now - turnedAt >= TOUCH_EVERY_MS) {
      older = recent;
      recent = new Set();
      turnedAt = now;
    }
    if (recent.has(sid) || older.has(sid)) {
      callback?.();
      return Promise.resolve();
    }
    recent.add(sid);
    return callback ? touch(sid, data, callback) : touch(sid, data);
  }) as typeof store.touch;
  return store;
}
