import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from './schema/index';

/**
 * One pool per process; UTC on the wire so DATETIME columns round-trip as instants. `trace: false`:
 * mysql2 would otherwise capture a stack trace on every query for the rare one that fails, a few
 * per cent of the API's CPU under load; a failed query still carries its code and message.
 */
export function createDb(databaseUrl: string) {
  const pool = mysql.createPool({ uri: databaseUrl, connectionLimit: 20, timezone: 'Z', connectTimeout: 5_000, trace: false });
  const db = drizzle(pool, { schema, mode: 'default' });
  return { pool, db };
}

export type Db = ReturnType<typeof createDb>['db'];
export type DbPool = ReturnType<typeof createDb>['pool'];
