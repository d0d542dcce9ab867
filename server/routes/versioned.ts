import { and, eq, type SQL } from 'drizzle-orm';
import type { PgColumn, PgTable } from 'drizzle-orm/pg-core';
import type { Database } from '@/db/client';
import { conflict, notFound } from '@/server/errors';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

interface VersionedTable extends PgTable {
  id: PgColumn;
  version: PgColumn;
  ownerId: PgColumn;
}

/**
 * Optimistic concurrency for an owned row, inside a transaction: locks the row, answers 404 when
 * it is not the user's, 409 (with the stored copy) when `version` is not the stored one, and
 * otherwise writes `values` with the version bumped. Returns the updated row.
 */
export async function updateVersioned<T extends VersionedTable, Row extends { version: number }>(
  tx: Tx,
  table: T,
  where: { id: string; ownerId: string; extra?: SQL },
  version: number,
  values: Record<string, unknown>,
  toApi: (row: Row) => unknown,
  what: string,
): Promise<Row> {
  const cond = and(eq(table.id, where.id), eq(table.ownerId, where.ownerId), where.extra);
  const [current] = (await tx.select().from(table as PgTable).where(cond).for('update')) as unknown as Row[];
  if (!current) throw notFound(`No such ${what}`);
  if (current.version !== version) throw conflict(`This ${what} was changed elsewhere since you opened it`, { current: toApi(current) });
  const [updated] = (await tx
    .update(table)
    .set({ ...values, version: current.version + 1, updatedAt: new Date() } as never)
    .where(eq(table.id, where.id))
    .returning()) as unknown as Row[];
  return updated!;
}
