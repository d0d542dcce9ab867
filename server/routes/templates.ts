import { and, eq } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';
import { clubTemplate, clubTemplateVersion } from '@/db/schema';
import { forbidden, notFound } from '@/server/errors';
import type { Mailer } from '@/server/mail/mailer';
import { clubRolesOf, isClubManager, mailNewVersion, snapshotOfRecipe, templateDetail, templateOfClub, templateSummaries, toVersionDetail } from '@/server/templates';
import { templateCreateSchema, templateListQuerySchema, templatePatchSchema, templateVersionCreateSchema } from '@/shared/schemas/club-api';
import { useTemplate } from './template-use';
import { parseBody, parseId, parseQuery } from './validate';

type Params = { clubId: string; templateId?: string; v?: string };

/** Owner or admin of the club: 404 for non-members, 403 for plain members. */
async function requireManager(db: Database, userId: string, clubId: string): Promise<void> {
  if (!isClubManager(await clubRolesOf(db, userId, clubId))) throw forbidden('Only a club owner or admin can do that');
}

/** /api/clubs/:clubId/templates: a club's shared recipe templates (immutable, versioned). */
export function templatesRouter(db: Database, mailer: Mailer, baseUrl: string): Router {
  const r = Router({ mergeParams: true });

  r.get('/', async (req, res) => {
    const { clubId } = req.params as Params;
    const roles = await clubRolesOf(db, res.locals.user.id, clubId);
    const q = parseQuery(templateListQuerySchema, req);
    res.json({ templates: await templateSummaries(db, clubId, { q: q.q, tag: q.tag, withRetired: q.retired === '1' && isClubManager(roles) }) });
  });

  r.post('/', async (req, res) => {
    const { clubId } = req.params as Params;
    const userId = res.locals.user.id;
    await requireManager(db, userId, clubId);
    const body = parseBody(templateCreateSchema, req);
    const snap = await snapshotOfRecipe(db, userId, body.recipeId);
    const created = await db.transaction(async (tx) => {
      const [t] = await tx.insert(clubTemplate).values({ clubId, title: body.title, description: body.description, tags: body.tags, latestVersion: 1, createdBy: userId }).returning();
      await tx.insert(clubTemplateVersion).values({ templateId: t!.id, version: 1, changelog: body.changelog, ...snap, createdBy: userId });
      return t!;
    });
    res.status(201).json({ template: await templateDetail(db, created, userId) });
  });

  r.get('/:templateId', async (req, res) => {
    const { clubId, templateId } = req.params as Params;
    await clubRolesOf(db, res.locals.user.id, clubId);
    const t = await templateOfClub(db, clubId, parseId(templateId, 'template'));
    res.json({ template: await templateDetail(db, t, res.locals.user.id) });
  });

  r.get('/:templateId/versions/:v', async (req, res) => {
    const { clubId, templateId, v } = req.params as Params;
    await clubRolesOf(db, res.locals.user.id, clubId);
    const t = await templateOfClub(db, clubId, parseId(templateId, 'template'));
    const version = Number(v);
    const [row] = Number.isInteger(version) ? await db.select().from(clubTemplateVersion).where(and(eq(clubTemplateVersion.templateId, t.id), eq(clubTemplateVersion.version, version))) : [];
    if (!row) throw notFound('No such version');
    res.json({ version: toVersionDetail(row) });
  });

  r.post('/:templateId/versions', async (req, res) => {
    const { clubId, templateId } = req.params as Params;
    const userId = res.locals.user.id;
    await requireManager(db, userId, clubId);
    const id = parseId(templateId, 'template');
    await templateOfClub(db, clubId, id);
    const body = parseBody(templateVersionCreateSchema, req);
    const snap = await snapshotOfRecipe(db, userId, body.recipeId);
    const updated = await db.transaction(async (tx) => {
      const t = await templateOfClub(tx, clubId, id, true);
      const version = t.latestVersion + 1;
      await tx.insert(clubTemplateVersion).values({ templateId: t.id, version, changelog: body.changelog, ...snap, createdBy: userId });
      const [saved] = await tx.update(clubTemplate).set({ latestVersion: version, updatedAt: new Date() }).where(eq(clubTemplate.id, t.id)).returning();
      return saved!;
    });
    await mailNewVersion(db, mailer, baseUrl, updated, userId);
    res.status(201).json({ template: await templateDetail(db, updated, userId) });
  });

  r.patch('/:templateId', async (req, res) => {
    const { clubId, templateId } = req.params as Params;
    const userId = res.locals.user.id;
    await requireManager(db, userId, clubId);
    const t = await templateOfClub(db, clubId, parseId(templateId, 'template'));
    const body = parseBody(templatePatchSchema, req);
    const [saved] = await db
      .update(clubTemplate)
      .set({ title: body.title ?? t.title, description: body.description ?? t.description, tags: body.tags ?? t.tags, updatedAt: new Date() })
      .where(eq(clubTemplate.id, t.id))
      .returning();
    res.json({ template: await templateDetail(db, saved!, userId) });
  });

  r.post('/:templateId/retire', async (req, res) => {
    const { clubId, templateId } = req.params as Params;
    const userId = res.locals.user.id;
    await requireManager(db, userId, clubId);
    const t = await templateOfClub(db, clubId, parseId(templateId, 'template'));
    const [saved] = await db.update(clubTemplate).set({ retiredAt: t.retiredAt ?? new Date(), updatedAt: new Date() }).where(eq(clubTemplate.id, t.id)).returning();
    res.json({ template: await templateDetail(db, saved!, userId) });
  });

  r.post('/:templateId/use', async (req, res) => {
    const { clubId, templateId } = req.params as Params;
    await clubRolesOf(db, res.locals.user.id, clubId);
    const t = await templateOfClub(db, clubId, parseId(templateId, 'template'));
    res.status(201).json({ recipe: await useTemplate(db, res.locals.user.id, t, req) });
  });

  return r;
}
