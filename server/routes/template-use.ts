import { and, eq, inArray } from 'drizzle-orm';
import type { Request } from 'express';
import type { Database } from '@/db/client';
import { clubTemplate, clubTemplateVersion, rig, site, target, templateUse } from '@/db/schema';
import { HttpError, notFound } from '@/server/errors';
import { fromTemplateTree, stageIdsOf } from '@/shared/recipe/template';
import type { RecipeTree } from '@/shared/recipe/types';
import type { RigInput } from '@/shared/rig/schema';
import type { RecipeDetail } from '@/shared/schemas/recipe-api';
import { templateUseSchema } from '@/shared/schemas/club-api';
import { createRecipeIn, toRecipe } from './recipes';
import { parseBody } from './validate';

type TemplateRow = typeof clubTemplate.$inferSelect;
type Fields = Record<string, string[]>;

const invalid = (fields: Fields) => new HttpError(400, 'invalid-input', 'Some fields need attention', { fields });

/** The user's rig, site and targets named by the body: field errors for any that are not theirs. */
async function checkOwnLinks(db: Database, userId: string, body: ReturnType<typeof templateUseSchema.parse>, stageIds: string[]): Promise<RigInput | null> {
  const fields: Fields = {};
  const [r] = body.rigId ? await db.select({ spec: rig.spec }).from(rig).where(and(eq(rig.id, body.rigId), eq(rig.ownerId, userId))) : [];
  if (body.rigId && !r) fields.rigId = ['No such rig'];
  if (body.siteId && !(await db.select({ id: site.id }).from(site).where(and(eq(site.id, body.siteId), eq(site.ownerId, userId))))[0]) fields.siteId = ['No such site'];
  const wanted = Object.values(body.targetIds).filter((x): x is string => x !== null);
  const found = wanted.length ? await db.select({ id: target.id }).from(target).where(and(eq(target.ownerId, userId), inArray(target.id, wanted))) : [];
  for (const [stageId, targetId] of Object.entries(body.targetIds)) {
    if (!stageIds.includes(stageId)) fields[`targetIds.${stageId}`] = ['No such stage in the template'];
    else if (targetId && !found.some((f) => f.id === targetId)) fields[`targetIds.${stageId}`] = ['No such target'];
  }
  if (Object.keys(fields).length) throw invalid(fields);
  return (r?.spec as RigInput | undefined) ?? null;
}

/**
 * Copies a template version into the user's recipes: bands mapped to the rig's filters (or the
 * body's `bandMap`), targets set per stage, fresh ids; records the use. A band with no filter
 * answers 400 `unmapped-bands` listing them, and nothing is stored.
 */
export async function useTemplate(db: Database, userId: string, t: TemplateRow, req: Request): Promise<RecipeDetail> {
  const body = parseBody(templateUseSchema, req);
  if (t.retiredAt) throw new HttpError(409, 'template-retired', 'This template is retired: members can no longer use it');
  const version = body.version ?? t.latestVersion;
  const [v] = await db.select().from(clubTemplateVersion).where(and(eq(clubTemplateVersion.templateId, t.id), eq(clubTemplateVersion.version, version)));
  if (!v) throw body.version === undefined ? notFound('No such version') : invalid({ version: ['No such version'] });
  const source = v.tree as RecipeTree;
  const rigSpec = await checkOwnLinks(db, userId, body, stageIdsOf(source));
  const made = fromTemplateTree(source, { rig: rigSpec, bandMap: body.bandMap, targetIds: body.targetIds });
  if (made.badMappings.length) throw invalid(Object.fromEntries(made.badMappings.map((b) => [`bandMap.${b}`, ['No filter of that name in the rig']])));
  if (made.unmapped.length) {
    throw new HttpError(400, 'unmapped-bands', `No filter in the rig for ${made.unmapped.join(', ')}: choose one for each`, { bands: made.unmapped });
  }
  const row = await db.transaction(async (tx) => {
    const created = await createRecipeIn(tx, { ownerId: userId, name: body.name ?? t.title, notes: `From the club template "${t.title}", version ${version}.`, rigId: body.rigId, siteId: body.siteId, tree: made.tree });
    await tx.insert(templateUse).values({ templateId: t.id, version, userId, recipeId: created.id });
    return created;
  });
  return toRecipe(row);
}
