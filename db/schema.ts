/**
 * Nightloom's own tables. better-auth's tables live in ./auth-schema.ts and are re-exported
 * here so that one `schema` object describes the whole database for Drizzle and drizzle-kit.
 */
import { sql } from 'drizzle-orm';
import { boolean, doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { user } from './auth-schema';

export * from './auth-schema';

/** An observing site. `version` is bumped on every update (optimistic concurrency). */
export const site = pgTable(
  'site',
  {
    id: uuid().primaryKey().defaultRandom(),
    ownerId: text().notNull().references(() => user.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    latitudeDeg: doublePrecision().notNull(),
    longitudeDeg: doublePrecision().notNull(),
    elevationM: doublePrecision().notNull(),
    timeZone: text().notNull(),
    isDefault: boolean().notNull().default(false),
    version: integer().notNull().default(1),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('site_owner_id_idx').on(t.ownerId),
    // At most one default site per owner, enforced by the database.
    uniqueIndex('site_one_default_per_owner').on(t.ownerId).where(sql`${t.isDefault}`),
  ],
);

/**
 * Mail captured by the local SMTP fake (development and tests only). Kept in the database so
 * that any server process can show it and none keeps state of its own.
 */
export const devMail = pgTable(
  'dev_mail',
  {
    id: uuid().primaryKey().defaultRandom(),
    from: text().notNull(),
    to: jsonb().$type<string[]>().notNull(),
    subject: text().notNull(),
    text: text().notNull().default(''),
    html: text().notNull().default(''),
    receivedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('dev_mail_received_at_idx').on(t.receivedAt)],
);
