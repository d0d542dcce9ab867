import { eq } from 'drizzle-orm';
import { Router } from 'express';
import type { Database } from '@/db/client';
import { invitation, organization, user } from '@/db/schema';
import { HttpError, notFound } from '@/server/errors';
import { invitationIdSchema, type InvitationPreview } from '@/shared/schemas/club-api';

/** "tomas@quarryhill.example" → "t***@quarryhill.example": enough to recognise one's own address. */
export function maskEmail(email: string): string {
  const at = email.lastIndexOf('@');
  if (at < 1) return '***';
  return `${email.charAt(0)}***${email.slice(at)}`;
}

/** Why a stored invitation no longer opens: better-auth keeps the row with its final status. */
const CLOSED_BY_STATUS: Record<string, [code: string, message: string]> = {
  canceled: ['invitation-revoked', 'The club withdrew this invitation. Ask them for a new one.'],
  accepted: ['invitation-accepted', 'This invitation has already been accepted.'],
  rejected: ['invitation-declined', 'This invitation was declined.'],
};
const EXPIRED: [string, string] = ['invitation-expired', 'This invitation has expired. Ask the club for a new one.'];

/**
 * GET /api/invitations/:id/preview, the one club route without a session: the invitation page
 * shows a signed-out visitor who invites them where, before they sign up or in. The id is an
 * unguessable token mailed to one person, so it answers only for a pending, unexpired invitation
 * and only with names, the role, the masked address and the expiry (never ids or members).
 * Rate limited per client address in server/app.ts (`rateLimitPerClient`, counts in PostgreSQL).
 */
export function invitationPreviewRouter(db: Database): Router {
  const r = Router();
  r.get('/:id/preview', async (req, res) => {
    res.set('Cache-Control', 'no-store');
    const id = invitationIdSchema.safeParse(req.params.id);
    if (!id.success) throw new HttpError(400, 'invalid-invitation-id', 'This is not an invitation link. Check that the whole link was copied.');
    const [row] = await db
      .select({ status: invitation.status, expiresAt: invitation.expiresAt, email: invitation.email, role: invitation.role, clubName: organization.name, inviterName: user.name })
      .from(invitation)
      .innerJoin(organization, eq(organization.id, invitation.organizationId))
      .innerJoin(user, eq(user.id, invitation.inviterId))
      .where(eq(invitation.id, id.data));
    if (!row) throw notFound('No invitation has this link. Ask the club for a new one.');
    const closed = row.status !== 'pending' ? (CLOSED_BY_STATUS[row.status] ?? ['invitation-closed', 'This invitation is no longer open.']) : row.expiresAt.getTime() <= Date.now() ? EXPIRED : null;
    if (closed) throw new HttpError(410, ...closed);
    const body: InvitationPreview = {
      clubName: row.clubName,
      inviterName: row.inviterName,
      role: row.role ?? 'member',
      email: maskEmail(row.email),
      expiresAt: row.expiresAt.toISOString(),
      status: 'pending',
    };
    res.json(body);
  });
  return r;
}
