import { and, eq } from 'drizzle-orm';
import type { Database } from '@/db/client';
import { member, organization } from '@/db/schema';
import { forbidden, notFound } from './errors';

export type ClubRole = 'owner' | 'admin' | 'member';

/** The clubs a user belongs to, with their roles (a stored role may be a comma list). */
export async function clubMemberships(db: Database, userId: string): Promise<{ clubId: string; clubName: string; roles: ClubRole[] }[]> {
  const rows = await db
    .select({ clubId: member.organizationId, clubName: organization.name, role: member.role })
    .from(member)
    .innerJoin(organization, eq(organization.id, member.organizationId))
    .where(eq(member.userId, userId));
  return rows.map((r) => ({ clubId: r.clubId, clubName: r.clubName, roles: r.role.split(',').map((x) => x.trim()) as ClubRole[] }));
}

/**
 * Throws 404 when the user is not in the club (non-members see nothing of it) and 403 when
 * they are but hold none of `roles`.
 */
export async function requireClubRole(db: Database, userId: string, clubId: string, roles: ClubRole[]): Promise<void> {
  const [row] = await db.select({ role: member.role }).from(member).where(and(eq(member.userId, userId), eq(member.organizationId, clubId)));
  if (!row) throw notFound('No such club');
  const held = row.role.split(',').map((x) => x.trim());
  if (!roles.some((r) => held.includes(r))) throw forbidden(`Only a club ${roles.join(' or ')} can do that`);
}
