import { afterAll, describe, expect, it } from 'vitest';
import mysql from 'mysql2/promise';
import { drizzle } from 'drizzle-orm/mysql2';
import { runMigrations } from '../../api/db/migrate';

const name = `sojourn_mig_${process.pid}`;
const base = new URL(process.env.DATABASE_URL!);
const admin = await mysql.createConnection({ uri: base.toString() });
afterAll(async () => {
  await admin.query(`DROP DATABASE IF EXISTS \`${name}\``);
  await admin.end();
});

describe('the committed migrations', () => {
  it('apply to an empty database, twice without harm', async () => {
    await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4`);
    const url = new URL(base);
    url.pathname = `/${name}`;
    const pool = mysql.createPool({ uri: url.toString() });
    try {
      await runMigrations(drizzle(pool, { mode: 'default' }));
      await runMigrations(drizzle(pool, { mode: 'default' }));
      const [rows] = await pool.query('SHOW TABLES');
      const tables = (rows as Record<string, string>[]).map((r) => Object.values(r)[0]);
      expect(tables).toEqual(expect.arrayContaining(['users', 'engagements', 'memberships', 'audit_entries', 'sessions', 'access_tokens']));
    } finally {
      await pool.end();
    }
  });
});
