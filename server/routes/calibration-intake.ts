import { randomUUID } from 'node:crypto';
import { and, desc, eq, lt, or, sql, type SQL } from 'drizzle-orm';
import express, { Router } from 'express';
import { z } from 'zod';
import type { Database } from '@/db/client';
import { captureFrame } from '@/db/schema';
import { notFound } from '@/server/errors';
import { frameNightDate, readIntakeFile } from '@/shared/calibration/intake';
import type { StoredFrame } from '@/shared/calibration/types';
import { FRAME_TYPES, intakeRequestSchema, type IntakeList, type IntakeResult, type IntakeSummary } from '@/shared/schemas/calibration-api';
import { nightDateSchema } from '@/shared/schemas/night';
import { findDefaultSite } from './sites';
import { parseBody, parseId, parseQuery } from './validate';

type FrameRow = typeof captureFrame.$inferSelect;

/**
 * Largest intake body: INTAKE_MAX_FILES headers of up to three blocks each as base64, plus names
 * (a typical camera header with a plate solution is one to three 2880-byte blocks).
 */
export const INTAKE_BODY_LIMIT = '24mb';
/** Rows per INSERT (28 columns: well under PostgreSQL's 65535 parameters). */
const INSERT_CHUNK = 500;

/** POST /api/calibration/intake: FITS header bytes of many files → recorded frames (one transaction). */
export function calibrationIntakeRouter(db: Database): Router {
  const r = Router();
  r.post('/', express.json({ limit: INTAKE_BODY_LIMIT }), async (req, res) => {
    const ownerId = res.locals.user.id;
    const body = parseBody(intakeRequestSchema, req);
    const timeZone = (await findDefaultSite(db, ownerId))?.timeZone ?? 'UTC';
    const intakeId = randomUUID();
    const rejected: IntakeResult['rejected'] = [];
    const fresh = new Map<string, StoredFrame>();
    let duplicates = 0;
    for (const file of body.files) {
      const bytes = Buffer.from(file.headerBase64, 'base64');
      const outcome = readIntakeFile(file.name, new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.byteLength));
      if (!outcome.ok) {
        rejected.push({ name: outcome.name, reason: outcome.reason, kind: outcome.kind });
      } else if (fresh.has(outcome.frame.fingerprint)) {
        duplicates += 1;
      } else {
        fresh.set(outcome.frame.fingerprint, { ...outcome.frame, nightDate: frameNightDate(outcome.frame.takenAt, timeZone) });
      }
    }
    const rows = [...fresh.values()].map((f) => ({ ...f, takenAt: new Date(f.takenAt), ownerId, intakeId }));
    const inserted = await db.transaction(async (tx) => {
      const out: { frameType: FrameRow['frameType'] }[] = [];
      for (let i = 0; i < rows.length; i += INSERT_CHUNK) {
        const part = rows.slice(i, i + INSERT_CHUNK);
        out.push(...(await tx.insert(captureFrame).values(part).onConflictDoNothing({ target: [captureFrame.ownerId, captureFrame.fingerprint] }).returning({ frameType: captureFrame.frameType })));
      }
      return out;
    });
    const recorded = { light: 0, dark: 0, flat: 0, bias: 0 };
    for (const row of inserted) recorded[row.frameType] += 1;
    duplicates += rows.length - inserted.length;
    const result: IntakeResult = { intakeId, recorded, duplicates, rejected };
    res.json(result);
  });
  return r;
}

const framesQuerySchema = z.object({
  type: z.enum(FRAME_TYPES, { error: 'Type is light, dark, flat or bias' }).optional(),
  night: nightDateSchema.optional(),
  limit: z.coerce.number({ error: 'Limit must be a number' }).int('Limit is a whole number').min(1, 'Limit is 1 to 500').max(500, 'Limit is 1 to 500').default(100),
  /** The `nextCursor` of the previous page. */
  cursor: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}T[\d:.]+Z_[0-9a-f-]{36}$/i, 'Not a cursor from this list')
    .optional(),
});

/** Object names listed per import; the rest is only counted ("and 4 more"). */
export const INTAKE_OBJECTS_SHOWN = 3;

const intakesQuerySchema = z.object({
  limit: z.coerce.number({ error: 'Limit must be a number' }).int('Limit is a whole number').min(1, 'Limit is 1 to 100').max(100, 'Limit is 1 to 100').default(20),
  /** The `nextCursor` of the previous page: the last import's time to the microsecond and its id. */
  cursor: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{6}Z_[0-9a-f-]{36}$/i, 'Not a cursor from this list')
    .optional(),
});

/**
 * The caller's imports, newest first, one row per intake grouped in SQL. An import's time is
 * its frames' earliest created_at, kept to the microsecond in the cursor (a millisecond Date
 * would skip or repeat imports made within the same millisecond).
 */
async function listIntakes(db: Database, ownerId: string, q: z.infer<typeof intakesQuerySchema>): Promise<IntakeList> {
  const importedAt = sql`min(${captureFrame.createdAt})`;
  const isLight = sql`${captureFrame.frameType} = 'light' and ${captureFrame.object} is not null`;
  const countOf = (type: string) => sql<number>`(count(*) filter (where ${captureFrame.frameType} = ${type}))::int`;
  let after: SQL | undefined;
  if (q.cursor) {
    const cut = q.cursor.lastIndexOf('_');
    after = sql`(${importedAt}, ${captureFrame.intakeId}) < (${q.cursor.slice(0, cut)}::timestamptz, ${q.cursor.slice(cut + 1)}::uuid)`;
  }
  const rows = await db
    .select({
      intakeId: captureFrame.intakeId,
      importedAt: sql<string>`to_char(${importedAt} at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.US"Z"')`,
      light: countOf('light'),
      dark: countOf('dark'),
      flat: countOf('flat'),
      bias: countOf('bias'),
      firstNight: sql<string>`min(${captureFrame.nightDate})`,
      lastNight: sql<string>`max(${captureFrame.nightDate})`,
      objects: sql<string[] | null>`(array_agg(distinct ${captureFrame.object} order by ${captureFrame.object}) filter (where ${isLight}))[1:${sql.raw(String(INTAKE_OBJECTS_SHOWN))}]`,
      objectCount: sql<number>`(count(distinct ${captureFrame.object}) filter (where ${isLight}))::int`,
    })
    .from(captureFrame)
    .where(eq(captureFrame.ownerId, ownerId))
    .groupBy(captureFrame.intakeId)
    .having(after)
    .orderBy(desc(importedAt), desc(captureFrame.intakeId))
    .limit(q.limit + 1);
  const page = rows.slice(0, q.limit);
  const last = page[page.length - 1];
  const intakes: IntakeSummary[] = page.map((r) => ({
    intakeId: r.intakeId,
    importedAt: new Date(r.importedAt).toISOString(),
    frames: { light: r.light, dark: r.dark, flat: r.flat, bias: r.bias },
    firstNight: r.firstNight,
    lastNight: r.lastNight,
    objects: r.objects ?? [],
    objectCount: r.objectCount,
  }));
  return { intakes, nextCursor: rows.length > q.limit && last ? `${last.importedAt}_${last.intakeId}` : null };
}

function toFrameItem(row: FrameRow) {
  const { ownerId: _owner, createdAt: _created, takenAt, ...rest } = row;
  return { ...rest, takenAt: takenAt.toISOString() };
}

/** /api/calibration: the recorded frames (newest first, paged), the past imports and the undo of one. */
export function calibrationFramesRouter(db: Database): Router {
  const r = Router();

  r.get('/frames', async (req, res) => {
    const q = parseQuery(framesQuerySchema, req);
    const conds: (SQL | undefined)[] = [eq(captureFrame.ownerId, res.locals.user.id), q.type ? eq(captureFrame.frameType, q.type) : undefined, q.night ? eq(captureFrame.nightDate, q.night) : undefined];
    if (q.cursor) {
      const cut = q.cursor.lastIndexOf('_');
      const at = new Date(q.cursor.slice(0, cut));
      const id = q.cursor.slice(cut + 1);
      conds.push(or(lt(captureFrame.takenAt, at), and(eq(captureFrame.takenAt, at), lt(captureFrame.id, id))));
    }
    const rows = await db
      .select()
      .from(captureFrame)
      .where(and(...conds))
      .orderBy(desc(captureFrame.takenAt), desc(captureFrame.id))
      .limit(q.limit + 1);
    const page = rows.slice(0, q.limit);
    const last = page[page.length - 1];
    res.json({ frames: page.map(toFrameItem), nextCursor: rows.length > q.limit && last ? `${last.takenAt.toISOString()}_${last.id}` : null });
  });

  r.get('/intakes', async (req, res) => {
    const q = parseQuery(intakesQuerySchema, req);
    res.json(await listIntakes(db, res.locals.user.id, q));
  });

  // Undo of an import: the frames it recorded go (frames it found already recorded stay).
  r.delete('/intakes/:intakeId', async (req, res) => {
    const intakeId = parseId(req.params.intakeId, 'intake');
    const gone = await db.delete(captureFrame).where(and(eq(captureFrame.ownerId, res.locals.user.id), eq(captureFrame.intakeId, intakeId))).returning({ id: captureFrame.id });
    if (gone.length === 0) throw notFound('No such intake');
    res.json({ deleted: gone.length });
  });

  return r;
}
