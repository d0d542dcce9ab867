import { and, asc, count, eq, inArray, isNull } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';
import { clubTemplate, invitation, member, organization, user } from '@/db/schema';
import { clubRolesOf, isClubManager, templateSummaries } from '@/server/templates';
import type { ClubDetail, ClubListItem } from '@/shared/schemas/club-api';

const splitRoles = (role: string) => role.split(',').map((r) => r.trim()).filter(Boolean);

/**
 * /api/clubs: the user's clubs and a club's page. Creating clubs, invitations, roles and leaving
 * go through better-auth's organization endpoints under /api/auth/organization/*.
 */
export function clubsRouter(db: Database): Router {
  const r = Router();

  r.get('/', async (_req, res) => {
    const mine = await db
      .select({ id: organization.id, name: organization.name, slug: organization.slug, role: member.role })
      .from(member)
      .innerJoin(organization, eq(organization.id, member.organizationId))
      .where(eq(member.userId, res.locals.user.id))
      .orderBy(asc(organization.name));
    const ids = mine.map((c) => c.id);
    const members = ids.length ? await db.select({ id: member.organizationId, n: count() }).from(member).where(inArray(member.organizationId, ids)).groupBy(member.organizationId) : [];
    const templates = ids.length
      ? await db.select({ id: clubTemplate.clubId, n: count() }).from(clubTemplate).where(and(inArray(clubTemplate.clubId, ids), isNull(clubTemplate.retiredAt))).groupBy(clubTemplate.clubId)
      : [];
    const clubs: ClubListItem[] = mine.map((c) => ({
      id: c.id,
      name: c.name,
      slug: c.slug,
      myRoles: splitRoles(c.role),
      memberCount: Number(members.find((m) => m.id === c.id)?.n ?? 0),
      templateCount: Number(templates.find((t) => t.id === c.id)?.n ?? 0),
    }));
    res.json({ clubs });
  });

  r.get('/:clubId', async (req, res) => {
    const clubId = req.params.clubId;
    const myRoles = await clubRolesOf(db, res.locals.user.id, clubId);
    const manager = isClubManager(myRoles);
    const [club] = await db.select({ id: organization.id, name: organization.name, slug: organization.slug }).from(organization).where(eq(organization.id, clubId));
    const members = await db
      .select({ memberId: member.id, userId: member.userId, name: user.name, email: user.email, role: member.role, joinedAt: member.createdAt })
      .from(member)
      .innerJoin(user, eq(user.id, member.userId))
      .where(eq(member.organizationId, clubId))
      .orderBy(asc(member.createdAt));
    // Pending invitations are for the people who manage the club.
    const invitations = manager
      ? await db
          .select({ id: invitation.id, email: invitation.email, role: invitation.role, status: invitation.status, expiresAt: invitation.expiresAt })
          .from(invitation)
          .where(and(eq(invitation.organizationId, clubId), eq(invitation.status, 'pending')))
          .orderBy(asc(invitation.createdAt))
      : [];
    const body: ClubDetail = {
      club: club!,
      myRoles,
      members: members.map((m) => ({ memberId: m.memberId, userId: m.userId, name: m.name, email: m.email, roles: splitRoles(m.role), joinedAt: m.joinedAt.toISOString() })),
      invitations: invitations.map((i) => ({ id: i.id, email: i.email, role: i.role ?? 'member', status: i.status, expiresAt: i.expiresAt.toISOString() })),
      templates: await templateSummaries(db, clubId, { withRetired: manager }),
    };
    res.json(body);
  });

  return r;
}
