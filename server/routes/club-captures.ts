import { and, eq } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';
import { captureShare, member, user } from '@/db/schema';
import { forbidden } from '@/server/errors';
import { historySummary } from '@/shared/calibration/history';
import type { SharedCapture } from '@/shared/schemas/calibration-api';
import { historyTargets, ownLights } from './history';

/**
 * GET /api/clubs/:clubId/captures: what the club's members chose to share of their captures,
 * one summary per shared target (totals by filter and night). Never frames, never a target its
 * owner did not share, and nothing of members who have left.
 */
export function clubCapturesRouter(db: Database): Router {
  const r = Router({ mergeParams: true });

  r.get('/', async (req, res) => {
    const clubId = (req.params as { clubId: string }).clubId;
    const [me] = await db.select({ id: member.id }).from(member).where(and(eq(member.userId, res.locals.user.id), eq(member.organizationId, clubId)));
    if (!me) throw forbidden('Only members of this club see what its members share');
    const shares = await db
      .select({ ownerId: captureShare.ownerId, targetId: captureShare.targetId, ownerName: user.name })
      .from(captureShare)
      .innerJoin(member, and(eq(member.userId, captureShare.ownerId), eq(member.organizationId, captureShare.organizationId)))
      .innerJoin(user, eq(user.id, captureShare.ownerId))
      .where(eq(captureShare.organizationId, clubId));
    const owners = new Map<string, { name: string; targetIds: Set<string> }>();
    for (const s of shares) {
      const o = owners.get(s.ownerId) ?? { name: s.ownerName, targetIds: new Set<string>() };
      o.targetIds.add(s.targetId);
      owners.set(s.ownerId, o);
    }
    const captures: SharedCapture[] = [];
    for (const [ownerId, o] of owners) {
      // Linking needs all of the owner's targets (a light goes to the nearest one); only shared rows leave.
      const rows = historySummary(await ownLights(db, ownerId), await historyTargets(db, ownerId), new Map());
      for (const t of rows) {
        if (t.targetId === null || !o.targetIds.has(t.targetId)) continue;
        captures.push({ ownerName: o.name, designation: t.label, name: t.name, frames: t.frames, seconds: t.seconds, nights: t.nights, lastNight: t.lastNight, byFilter: t.byFilter });
      }
    }
    captures.sort((a, b) => b.lastNight.localeCompare(a.lastNight) || a.designation.localeCompare(b.designation));
    res.json({ captures });
  });

  return r;
}
