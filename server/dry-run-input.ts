import { and, asc, eq, inArray } from 'drizzle-orm';
import type { Database } from '@/db/client';
import { framing, rig, target } from '@/db/schema';
import { HttpError } from '@/server/errors';
import type { DryRunInput, DryRunTarget } from '@/shared/dry-run';
import { targetIds } from '@/shared/recipe/summary';
import type { RecipeTree } from '@/shared/recipe/types';
import { defaultRigInput, type RigInput } from '@/shared/rig/schema';
import { currentNightDate } from '@/shared/night-date';
import { findDefaultSite, findOwnSite } from './routes/sites';

export interface DryRunContext {
  input: DryRunInput;
  siteId: string;
  rigId: string | null;
}

/**
 * Everything a dry run needs from the database, for one user: the rig (the recipe's, else a
 * rig with the defaults of trade-defaults.md), the site (the recipe's, else the default site),
 * the targets the tree points at with their framings, and the night's date.
 */
export async function loadDryRunContext(
  db: Database,
  ownerId: string,
  tree: RecipeTree,
  opts: { rigId: string | null; siteId: string | null; date?: string; startTime?: string },
): Promise<DryRunContext> {
  const siteRow = opts.siteId ? await findOwnSite(db, ownerId, opts.siteId) : await findDefaultSite(db, ownerId);
  if (!siteRow) throw new HttpError(404, 'no-site', 'Add a site first: the dry run plays the night at a place');
  let spec: RigInput = defaultRigInput();
  if (opts.rigId) {
    const [r] = await db.select({ spec: rig.spec }).from(rig).where(and(eq(rig.id, opts.rigId), eq(rig.ownerId, ownerId)));
    if (!r) throw new HttpError(400, 'invalid-input', 'Some fields need attention', { fields: { rigId: ['No such rig'] } });
    spec = r.spec;
  }
  const ids = targetIds(tree);
  const rows = ids.length ? await db.select().from(target).where(and(eq(target.ownerId, ownerId), inArray(target.id, ids))) : [];
  const frames = rows.length ? await db.select().from(framing).where(inArray(framing.targetId, rows.map((t) => t.id))).orderBy(asc(framing.createdAt)) : [];
  const targets: Record<string, DryRunTarget> = {};
  for (const t of rows) {
    targets[t.id] = {
      designation: t.designation,
      name: t.name,
      raDeg: t.raDeg,
      decDeg: t.decDeg,
      framings: frames.filter((f) => f.targetId === t.id).map((f) => ({ id: f.id, name: f.name, raDeg: f.raDeg, decDeg: f.decDeg, positionAngleDeg: f.positionAngleDeg })),
    };
  }
  return {
    siteId: siteRow.id,
    rigId: opts.rigId,
    input: {
      tree,
      rig: spec,
      site: siteRow,
      nightDate: opts.date ?? currentNightDate(siteRow.timeZone),
      startTime: opts.startTime,
      targets,
      darkLibrary: [],
    },
  };
}
