import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import * as schema from './schema';

export type Database = NodePgDatabase<typeof schema> & { $client: pg.Pool };

/** A pooled Drizzle client. The pool logs and survives idle-connection kills instead of crashing. */
export function createDatabase(url: string, max = 10): Database {
  const pool = new pg.Pool({ connectionString: url, max });
  pool.on('error', (err) => console.error('[db] idle client error:', err.message));
  return drizzle(pool, { schema, casing: 'snake_case' }) as Database;
}

export { schema };
