import { defineConfig } from 'drizzle-kit';

// Only `generate` is used (push/pull fail on MariaDB); the runtime migrator applies the SQL.
export default defineConfig({
  dialect: 'mysql',
  schema: './api/db/schema/index.ts',
  out: './drizzle',
});
