import { fromNodeHeaders } from 'better-auth/node';
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { Auth } from '@/server/auth';
import { SITE_ADMIN_ROLE } from '@/server/auth';
import { forbidden, HttpError } from '@/server/errors';

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: string;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Locals {
      user: SessionUser;
    }
  }
}

/** 401 JSON unless the request carries a valid session cookie; puts the user on `res.locals.user`. */
export function requireSession(auth: Auth): RequestHandler {
  return async (req: Request, res: Response, next: NextFunction) => {
    try {
      const session = await auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
      if (!session) throw new HttpError(401, 'unauthenticated', 'Sign in to continue');
      const u = session.user as typeof session.user & { role?: string | null; banned?: boolean | null };
      if (u.banned) throw forbidden('This account is suspended');
      res.locals.user = { id: u.id, email: u.email, name: u.name, role: u.role ?? 'user' };
      next();
    } catch (err) {
      next(err);
    }
  };
}

/** 403 unless the signed-in user is a site administrator. Use after requireSession. */
export const requireSiteAdmin: RequestHandler = (_req, res, next) => {
  const roles = res.locals.user.role.split(',').map((r) => r.trim());
  next(roles.includes(SITE_ADMIN_ROLE) ? undefined : forbidden('Only a site administrator can open this'));
};

/**
 * CSRF guard for the app's own cookie-authenticated writes (better-auth guards only its routes):
 * a state-changing request must come from one of our origins.
 */
export function requireSameOrigin(allowed: string[]): RequestHandler {
  return (req, _res, next) => {
    if (req.method === 'GET' || req.method === 'HEAD' || req.method === 'OPTIONS') return next();
    const origin = req.get('origin') ?? (req.get('referer') ? new URL(req.get('referer') as string).origin : undefined);
    if (!origin || !allowed.includes(origin)) return next(forbidden('Cross-site request refused'));
    next();
  };
}
