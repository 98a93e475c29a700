import { createDb } from './client';
import { runMigrations } from './migrate';

const url = process.env.DATABASE_URL;
if (!url) {
  console.error('DATABASE_URL is not set.');
  process.exit(1);
}
const { db, pool } = createDb(url);
await runMigrations(db);
await pool.end();
console.log('Migrations applied.');
