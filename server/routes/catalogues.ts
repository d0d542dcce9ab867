import { and, desc, eq, inArray, isNull, or } from 'drizzle-orm';
import express, { Router, type Request } from 'express';
import type { Database } from '@/db/client';
import { catalogue, catalogueObject, organization } from '@/db/schema';
import { clubMemberships, requireClubRole } from '@/server/clubs';
import { HttpError, notFound } from '@/server/errors';
import { catalogueImportQuerySchema, csvMappingSchema, type CatalogueSummary } from '@/shared/schemas/target';
import { detectCsvLayout, parseCatalogueCsv, type CsvMapping } from '@/shared/targets/csv-import';
import { foldForSearch } from '@/shared/targets/search';
import { parseId, parseQuery } from './validate';

/** Catalogue uploads are CSV text; OpenNGC's full file is ~4 MB. */
const csvBody = express.text({ type: ['text/csv', 'text/plain', 'application/csv'], limit: '16mb' });
const INSERT_BATCH = 1000;

function csvText(req: Request): string {
  if (typeof req.body !== 'string') throw new HttpError(415, 'unsupported-media-type', 'Send the catalogue as text/csv');
  if (req.body.trim() === '') throw new HttpError(400, 'invalid-csv', 'The file is empty', { rows: [] });
  return req.body;
}

function mappingFor(text: string, raw: string | undefined): { headers: string[]; mapping: CsvMapping } {
  const layout = detectCsvLayout(text);
  if (!raw) return layout;
  let json: unknown;
  try {
    json = JSON.parse(raw);
  } catch {
    throw new HttpError(400, 'invalid-input', 'The column mapping is not valid JSON', { fields: { mapping: ['Not valid JSON'] } });
  }
  return { headers: layout.headers, mapping: csvMappingSchema.parse(json) as CsvMapping };
}

/** Everything a search matches on, each part folded (see `foldForSearch`) and separated by a space. */
export const searchKeyOf = (o: { designation: string; aliases: string[]; name: string }) => [o.designation, ...o.aliases, o.name].map(foldForSearch).filter(Boolean).join(' ');

/** Catalogues the user can read: their own personal ones and those of every club they are in. */
export async function readableCatalogues(db: Database, userId: string) {
  const clubs = await clubMemberships(db, userId);
  const clubIds = clubs.map((c) => c.clubId);
  const visible = clubIds.length ? or(and(eq(catalogue.ownerId, userId), isNull(catalogue.clubId)), inArray(catalogue.clubId, clubIds)) : and(eq(catalogue.ownerId, userId), isNull(catalogue.clubId));
  return db
    .select({ id: catalogue.id, name: catalogue.name, objectCount: catalogue.objectCount, clubId: catalogue.clubId, clubName: organization.name, ownerId: catalogue.ownerId, createdAt: catalogue.createdAt })
    .from(catalogue)
    .leftJoin(organization, eq(organization.id, catalogue.clubId))
    .where(visible)
    .orderBy(desc(catalogue.createdAt));
}

const summary = (c: Awaited<ReturnType<typeof readableCatalogues>>[number], userId: string): CatalogueSummary => ({
  id: c.id,
  name: c.name,
  objectCount: c.objectCount,
  clubId: c.clubId,
  clubName: c.clubName ?? null,
  ownedByMe: c.ownerId === userId,
  createdAt: c.createdAt.toISOString(),
});

/** /api/catalogues: imported catalogues, personal or shared with a club. */
export function cataloguesRouter(db: Database): Router {
  const r = Router();

  r.get('/', async (_req, res) => {
    const userId = res.locals.user.id;
    res.json({ catalogues: (await readableCatalogues(db, userId)).map((c) => summary(c, userId)) });
  });

  // Parse and report; nothing is stored.
  r.post('/preview', csvBody, async (req, res) => {
    const query = parseQuery(catalogueImportQuerySchema, req);
    const text = csvText(req);
    const { headers, mapping } = mappingFor(text, query.mapping);
    const parsed = parseCatalogueCsv(text, mapping);
    res.json({ layout: { headers, mapping }, count: parsed.rows.length, sample: parsed.rows.slice(0, 20), errors: parsed.errors.slice(0, 200), errorCount: parsed.errors.length, skipped: parsed.skipped });
  });

  // Parse, then store every good row in one transaction; with bad rows only when the user accepted them.
  r.post('/', csvBody, async (req, res) => {
    const userId = res.locals.user.id;
    const query = parseQuery(catalogueImportQuerySchema, req);
    if (!query.name) throw new HttpError(400, 'invalid-input', 'Some fields need attention', { fields: { name: ['Give the catalogue a name'] } });
    if (query.clubId) await requireClubRole(db, userId, query.clubId, ['owner', 'admin']);
    const text = csvText(req);
    const parsed = parseCatalogueCsv(text, mappingFor(text, query.mapping).mapping);
    if (parsed.errors.length > 0 && query.acceptErrors !== '1') {
      throw new HttpError(400, 'invalid-csv', `${parsed.errors.length} row(s) could not be read; nothing was imported`, { rows: parsed.errors.slice(0, 200), errorCount: parsed.errors.length });
    }
    if (parsed.rows.length === 0) throw new HttpError(400, 'invalid-csv', 'The file has no objects to import', { rows: parsed.errors.slice(0, 200) });
    const created = await db.transaction(async (tx) => {
      const [cat] = await tx.insert(catalogue).values({ ownerId: userId, clubId: query.clubId ?? null, name: query.name!, objectCount: parsed.rows.length }).returning();
      for (let i = 0; i < parsed.rows.length; i += INSERT_BATCH) {
        const batch = parsed.rows.slice(i, i + INSERT_BATCH).map((o) => ({ ...o, catalogueId: cat!.id, searchKey: searchKeyOf(o) }));
        await tx.insert(catalogueObject).values(batch);
      }
      return cat!;
    });
    const [row] = (await readableCatalogues(db, userId)).filter((c) => c.id === created.id);
    res.status(201).json({ catalogue: summary(row!, userId), imported: parsed.rows.length, skippedRows: parsed.errors.length });
  });

  r.delete('/:id', async (req, res) => {
    const userId = res.locals.user.id;
    const id = parseId(req.params.id, 'catalogue');
    const [row] = (await readableCatalogues(db, userId)).filter((c) => c.id === id);
    if (!row) throw notFound('No such catalogue');
    // A club's catalogue may be removed by whoever imported it or by a club owner or admin.
    if (row.clubId && row.ownerId !== userId) await requireClubRole(db, userId, row.clubId, ['owner', 'admin']);
    if (!row.clubId && row.ownerId !== userId) throw notFound('No such catalogue');
    await db.delete(catalogue).where(eq(catalogue.id, id));
    res.status(204).end();
  });

  return r;
}
