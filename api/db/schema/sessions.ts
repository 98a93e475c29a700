import { int, mediumtext, mysqlTable, varchar } from 'drizzle-orm/mysql-core';

/**
 * Session rows in the layout express-mysql-session expects (its own CREATE is disabled so the
 * schema lives in our migrations). Keeping sessions here makes API processes stateless.
 */
export const sessions = mysqlTable('sessions', {
  sessionId: varchar('session_id', { length: 128 }).primaryKey(),
  expires: int('expires', { unsigned: true }).notNull(),
  data: mediumtext('data'),
});
