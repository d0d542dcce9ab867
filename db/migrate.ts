/**
 * Applies the committed SQL migrations. Drizzle's migrator takes no lock, so several processes
 * starting at once serialise on a PostgreSQL advisory lock. Exits non-zero on failure.
 */
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { createDatabase, type Database } from './client';

const MIGRATION_LOCK = 72_031_004;
export const migrationsFolder = path.join(path.dirname(fileURLToPath(import.meta.url)), 'migrations');

export async function runMigrations(db: Database): Promise<void> {
  const client = await db.$client.connect();
  try {
    await client.query('SELECT pg_advisory_lock($1)', [MIGRATION_LOCK]);
    await migrate(db, { migrationsFolder });
  } finally {
    await client.query('SELECT pg_advisory_unlock($1)', [MIGRATION_LOCK]).catch(() => undefined);
    client.release();
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const url = process.env.DATABASE_URL;
  if (!url) {
    console.error('DATABASE_URL is not set');
    process.exit(1);
  }
  const db = createDatabase(url, 2);
  runMigrations(db)
    .then(() => console.log('[db] migrations applied'))
    .catch((err: unknown) => {
      console.error('[db] migration failed:', err);
      process.exitCode = 1;
    })
    .finally(() => db.$client.end());
}
