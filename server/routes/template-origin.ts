import { and, desc, eq, gt, isNull } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';
import { clubTemplate, clubTemplateVersion, member, recipe, templateUse } from '@/db/schema';
import { notFound } from '@/server/errors';
import { abstractRecipe } from '@/server/templates';
import type { SuggestedTarget } from '@/shared/recipe/template';
import { diffTemplateTrees } from '@/shared/recipe/template-diff';
import type { RecipeTree } from '@/shared/recipe/types';
import type { TemplateDiff, TemplateOrigin } from '@/shared/schemas/club-api';
import { parseId } from './validate';

/**
 * The template a recipe was made from (the newest use that created it), while the user is still
 * in the template's club; null otherwise.
 */
async function originOf(db: Database, userId: string, recipeId: string) {
  const [own] = await db.select().from(recipe).where(and(eq(recipe.id, recipeId), eq(recipe.ownerId, userId), isNull(recipe.deletedAt)));
  if (!own) throw notFound('No such recipe');
  const [use] = await db
    .select({ version: templateUse.version, t: clubTemplate })
    .from(templateUse)
    .innerJoin(clubTemplate, eq(clubTemplate.id, templateUse.templateId))
    .innerJoin(member, and(eq(member.organizationId, clubTemplate.clubId), eq(member.userId, userId)))
    .where(and(eq(templateUse.recipeId, recipeId), eq(templateUse.userId, userId)))
    .orderBy(desc(templateUse.createdAt))
    .limit(1);
  return { own, use };
}

/** /api/recipes/:id/template-origin and /template-diff: a copy of a club template and its newer versions. */
export function recipeTemplateRouter(db: Database): Router {
  const r = Router();

  r.get('/:id/template-origin', async (req, res) => {
    const { use } = await originOf(db, res.locals.user.id, parseId(req.params.id, 'recipe'));
    if (!use) {
      res.json({ origin: null });
      return;
    }
    const newer = await db
      .select({ version: clubTemplateVersion.version, changelog: clubTemplateVersion.changelog, createdAt: clubTemplateVersion.createdAt })
      .from(clubTemplateVersion)
      .where(and(eq(clubTemplateVersion.templateId, use.t.id), gt(clubTemplateVersion.version, use.version)))
      .orderBy(desc(clubTemplateVersion.version));
    const origin: TemplateOrigin = {
      clubId: use.t.clubId,
      templateId: use.t.id,
      title: use.t.title,
      version: use.version,
      latestVersion: use.t.latestVersion,
      newer: use.t.latestVersion > use.version,
      newerVersions: newer.map((v) => ({ version: v.version, changelog: v.changelog, createdAt: v.createdAt.toISOString() })),
    };
    res.json({ origin });
  });

  // The user's copy, re-abstracted to bands with its rig, against the template's latest version.
  r.get('/:id/template-diff', async (req, res) => {
    const userId = res.locals.user.id;
    const { own, use } = await originOf(db, userId, parseId(req.params.id, 'recipe'));
    if (!use) throw notFound('This recipe was not made from a club template');
    const [latest] = await db.select().from(clubTemplateVersion).where(and(eq(clubTemplateVersion.templateId, use.t.id), eq(clubTemplateVersion.version, use.t.latestVersion)));
    const mine = await abstractRecipe(db, userId, own);
    const changes = diffTemplateTrees(mine.tree, latest!.tree as RecipeTree, { fromTargets: mine.suggestedTargets, toTargets: latest!.suggestedTargets as Record<string, SuggestedTarget> });
    const body: TemplateDiff = { from: use.version, to: use.t.latestVersion, changes };
    res.json(body);
  });

  return r;
}
