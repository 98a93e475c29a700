import { eq, sql } from 'drizzle-orm';
import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import type { Db } from '../db/client';
import { sessions, users } from '../db/schema/index';

/**
 * A rolling session would otherwise write its new expiry to MariaDB on every request (one
 * UPDATE and one redo-log flush per API call, most of the database's work under load). Once per
 * minute per session is enough for a 12-hour lifetime: the stored expiry then trails the cookie
 * by at most two minutes. Signing out and deactivation still write to the database at once; other
 * processes see them within the read cache's lifetime (SessionReadCache below).
 */
export const TOUCH_EVERY_MS = 60_000;

export type SignedInUser = Pick<typeof users.$inferSelect, 'id' | 'email' | 'name' | 'role' | 'status'>;
export type SessionStore = InstanceType<ReturnType<typeof MySQLStoreFactory>> & {
  /** The user row read with this session's data on this request (once), for passport's deserializer. */
  takeUser(sid: string): SignedInUser | undefined;
  /** Drops this person's cached sessions, after a change of role or status in this process. */
  forgetUser(userId: number): void;
};

export function createSessionStore(databaseUrl: string, db: Db, cacheMs = 0): SessionStore {
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
    // The answer does not wait for this write (express-session would hold the response's end for
    // it, a redo-log flush away): a failed one is logged and tried again at the next request.
    touch(sid, data, (err?: unknown) => {
      if (!err) return;
      recent.delete(sid);
      console.warn(`[api] could not extend a session's expiry: ${(err as Error).message ?? String(err)}`);
    });
    callback?.();
    return Promise.resolve();
  }) as typeof store.touch;

  // Every signed-in request needs its session and its user: one query reads both, so a request
  // costs one round trip to MariaDB less than reading the user separately.
  const withUser = db
    .select({ data: sessions.data, expires: sessions.expires, user: { id: users.id, email: users.email, name: users.name, role: users.role, status: users.status } })
    .from(sessions)
    .leftJoin(users, eq(users.id, sql`cast(json_value(${sessions.data}, '$.passport.user') as unsigned)`))
    .where(eq(sessions.sessionId, sql.placeholder('sid')))
    .prepare();
  const readUsers = new Map<string, SignedInUser>();
  const cache = new SessionReadCache(cacheMs);
  const get = async (sid: string): Promise<session.SessionData | null> => {
    readUsers.delete(sid);
    const read = async (): Promise<SessionRow | undefined> => (await withUser.execute({ sid }))[0];
    const row = cache.get(sid, read) ?? cache.put(sid, await read());
    if (!row || row.expires < Math.round(Date.now() / 1000) || row.data === null) return null;
    // Bounded: an entry lives from here to the deserializer of the same request.
    if (readUsers.size > 10_000) readUsers.clear();
    if (row.user) readUsers.set(sid, row.user);
    // Parsed afresh each time: express-session mutates the object it is given.
    return JSON.parse(row.data) as session.SessionData;
  };
  for (const name of ['set', 'destroy'] as const) {
    const original = store[name].bind(store) as (sid: string, ...rest: unknown[]) => unknown;
    (store as unknown as Record<string, unknown>)[name] = (sid: string, ...rest: unknown[]) => {
      cache.forget(sid);
      return original(sid, ...rest);
    };
  }
  store.get = ((sid: string, callback?: (err: unknown, data?: session.SessionData | null) => void) => {
    const read = get(sid);
    if (callback) read.then((data) => callback(null, data), callback);
    return read;
  }) as typeof store.get;
  return Object.assign(store, {
    takeUser(sid: string): SignedInUser | undefined {
      const user = readUsers.get(sid);
      readUsers.delete(sid);
      return user;
    },
    forgetUser: (userId: number) => cache.forgetUser(userId),
  });
}

interface SessionRow {
  data: string | null;
  expires: number;
  user: SignedInUser | null;
}

/**
 * Under load most of a small request's cost is reading its session and user. Each process keeps
 * what it read for `ms` (SESSION_CACHE_MS, default 1 s; 0 turns it off). Past half that age the
 * entry is still used while one read in the background replaces it, so a busy session never waits
 * for MariaDB and nothing older than `ms` is ever used. Signing out, a new session and a change to
 * a person in this process drop the entry at once (and a background read then started is not
 * kept); another process sees such a change within `ms` at most, the same order as a request
 * already in flight.
 */
class SessionReadCache {
  private readonly rows = new Map<string, { row: SessionRow; at: number; refreshing: boolean }>();
  constructor(private readonly ms: number) {}

  get(sid: string, read: () => Promise<SessionRow | undefined>): SessionRow | undefined {
    const hit = this.rows.get(sid);
    const age = hit ? Date.now() - hit.at : Infinity;
    if (!hit || age >= this.ms) return undefined;
    if (age >= this.ms / 2 && !hit.refreshing) {
      hit.refreshing = true;
      read().then(
        (row) => {
          if (this.rows.get(sid) !== hit) return;
          if (row) this.put(sid, row);
          else this.rows.delete(sid);
        },
        // The next request past `ms` reads it itself, and fails as the database does.
        () => undefined,
      );
    }
    return hit.row;
  }

  put(sid: string, row: SessionRow | undefined): SessionRow | undefined {
    if (this.ms <= 0 || !row) return row;
    const now = Date.now();
    if (this.rows.size >= 10_000) for (const [k, v] of this.rows) if (now - v.at >= this.ms) this.rows.delete(k);
    if (this.rows.size < 10_000 || this.rows.has(sid)) this.rows.set(sid, { row, at: now, refreshing: false });
    return row;
  }

  forget(sid: string): void {
    this.rows.delete(sid);
  }

  forgetUser(userId: number): void {
    for (const [k, v] of this.rows) if (v.row.user?.id === userId) this.rows.delete(k);
  }
}
