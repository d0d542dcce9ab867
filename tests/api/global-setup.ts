/** Applies the migrations to the test database that `npm test` created for this run. */
import { createDatabase } from '@/db/client';
import { runMigrations } from '@/db/migrate';

export default async function setup() {
  const url = process.env.TEST_DATABASE_URL;
  if (!url) throw new Error('TEST_DATABASE_URL is not set: run the API tests through `npm test`');
  const db = createDatabase(url, 2);
  try {
    await runMigrations(db);
  } finally {
    await db.$client.end();
  }
}
