import { betterAuth } from 'better-auth';
import { eq } from 'drizzle-orm';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { admin, organization } from 'better-auth/plugins';
import type { Database } from '@/db/client';
import * as schema from '@/db/schema';
import type { Env } from './env';
import { actionMail, type Mailer } from './mail/mailer';

/** Set by the server from `req.ip` before better-auth sees a request; any client value is replaced. */
export const CLIENT_IP_HEADER = 'x-nightloom-client-ip';

/** Roles inside a club (better-auth organization plugin). */
export const CLUB_ROLES = ['owner', 'admin', 'member'] as const;
/** Site-wide role of a site administrator (better-auth admin plugin). */
export const SITE_ADMIN_ROLE = 'admin';

export function createAuth(env: Env, db: Database, mailer: Mailer) {
  return betterAuth({
    appName: 'Nightloom',
    logger: { disabled: env.NODE_ENV === 'test', level: 'warn' },
    baseURL: env.BASE_URL,
    basePath: '/api/auth',
    secret: env.BETTER_AUTH_SECRET,
    trustedOrigins: [new URL(env.BASE_URL).origin],
    database: drizzleAdapter(db, { provider: 'pg', schema }),
    emailAndPassword: {
      enabled: true,
      minPasswordLength: 8,
      maxPasswordLength: 128,
      revokeSessionsOnPasswordReset: true,
      resetPasswordTokenExpiresIn: 3600,
      sendResetPassword: async ({ user, url }) => {
        await mailer.send(
          actionMail(user.email, 'Reset your Nightloom password', `Someone asked to reset the password of ${user.email}. The link works for one hour.`, 'Choose a new password', url),
        );
      },
    },
    // Counters live in PostgreSQL (no per-process state). The client address comes from Express
    // (`req.ip`, which honours the trusted proxy setting), passed in CLIENT_IP_HEADER.
    rateLimit: {
      enabled: true,
      storage: 'database',
      window: 60,
      max: env.AUTH_RATE_LIMIT,
      customRules: {
        '/sign-in/email': { window: 60, max: env.AUTH_STRICT_RATE_LIMIT },
        '/sign-up/email': { window: 60, max: env.AUTH_STRICT_RATE_LIMIT },
        '/request-password-reset': { window: 60, max: env.AUTH_STRICT_RATE_LIMIT },
        '/reset-password': { window: 60, max: env.AUTH_STRICT_RATE_LIMIT },
      },
    },
    session: { expiresIn: 60 * 60 * 24 * 30, updateAge: 60 * 60 * 24 },
    advanced: {
      // better-auth turns its Origin (CSRF) check off when NODE_ENV=test; keep it on everywhere.
      disableOriginCheck: false,
      ipAddress: { ipAddressHeaders: [CLIENT_IP_HEADER] },
    },
    plugins: [
      admin({ defaultRole: 'user', adminRoles: [SITE_ADMIN_ROLE] }),
      organization({
        allowUserToCreateOrganization: true,
        creatorRole: 'owner',
        invitationExpiresIn: 60 * 60 * 24 * 7,
        sendInvitationEmail: async ({ email, invitation, organization: club, inviter }) => {
          const url = `${env.BASE_URL}/invitations/${invitation.id}`;
          await mailer.send(
            actionMail(email, `Join ${club.name} on Nightloom`, `${inviter.user.name} invites you to the club ${club.name} on Nightloom.`, 'Open the invitation', url),
          );
        },
        organizationHooks: {
          // Tell the inviter; a failed send must not undo the membership, so it is only logged.
          afterAcceptInvitation: async ({ invitation, user: joined, organization: club }) => {
            const [inviter] = await db.select({ email: schema.user.email }).from(schema.user).where(eq(schema.user.id, invitation.inviterId));
            if (!inviter) return;
            const url = `${env.BASE_URL}/clubs/${club.id}`;
            await mailer
              .send(actionMail(inviter.email, `${joined.name} joined ${club.name}`, `${joined.name} (${joined.email}) accepted your invitation and is now a member of ${club.name}.`, 'Open the club', url))
              .catch((err: unknown) => console.error('[mail] invitation accepted:', err));
          },
        },
      }),
    ],
  });
}

export type Auth = ReturnType<typeof createAuth>;
