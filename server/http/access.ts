import type { Request, RequestHandler } from 'express';
import type { Session, User } from 'lucia';
import type { DataSource } from 'typeorm';
import { roles, type Role } from '../../shared/api/auth';
import { rolesFor } from '../../shared/api/permissions';
import type { Auth } from '../auth/lucia';
import { Team } from '../db/entities';
import { HttpError, NotFoundError } from './errors';

/** Who may call a route: anyone, or signed-in members with one of these roles. */
export type Access = 'public' | readonly Role[];

export const anyMember: readonly Role[] = roles;
/** Role lists come from the one permission table (shared/api/permissions.ts) the client uses too. */
export const designers: readonly Role[] = rolesFor('designs.write');
export const admins: readonly Role[] = rolesFor('team.manage');
export const launchers: readonly Role[] = rolesFor('runs.launch');
export const deleters: readonly Role[] = rolesFor('records.delete');

declare module 'express-serve-static-core' {
  interface Request {
    auth?: { user: User; session: Session } | null;
    team?: Team;
  }
}

/**
 * Reads the session cookie on every API request. lucia extends a session
 * past half its life (`fresh`): the renewed cookie is sent back then.
 */
export function sessionReader(auth: Auth): RequestHandler {
  return (req, res, next) => {
    const id = auth.readSessionCookie(req.get('cookie') ?? '');
    if (!id) {
      req.auth = null;
      return next();
    }
    auth.validateSession(id).then(({ user, session }) => {
      if (session?.fresh) res.append('Set-Cookie', auth.createSessionCookie(session.id).serialize());
      if (!session) res.append('Set-Cookie', auth.createBlankSessionCookie().serialize());
      req.auth = user && session ? { user, session } : null;
      next();
    }, next);
  };
}

/** The one gate every route passes: signed in, allowed role, team loaded. */
export function authorize(ds: DataSource, access: Access): RequestHandler {
  return (req, _res, next) => {
    if (access === 'public') return next();
    if (!req.auth) return next(new HttpError(401, 'Sign in first.', undefined, 'Unauthorized'));
    const role = req.auth.user.role;
    if (!access.includes(role)) return next(new HttpError(403, `Your role (${role}) may not do this.`, undefined, 'Forbidden'));
    ds.getRepository(Team).findOneBy({ id: req.auth.user.teamId }).then((team) => {
      if (!team) throw new NotFoundError('team');
      req.team = team;
      next();
    }).catch(next);
  };
}

export function requireTeam(req: Request): Team {
  if (!req.team) throw new NotFoundError('team');
  return req.team;
}

export function requireUser(req: Request): User {
  if (!req.auth) throw new HttpError(401, 'Sign in first.', undefined, 'Unauthorized');
  return req.auth.user;
}

/** Who is acting, for provenance ("created by"). */
export function actorName(req: Request): string {
  return req.auth?.user.displayName ?? 'unknown';
}
