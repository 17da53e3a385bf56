import type { Response } from 'express';
import { acceptInvitationSchema, changePasswordSchema, resetConfirmSchema, resetRequestSchema, signInRequestSchema, signUpConfirmSchema, signUpRequestSchema } from '../../shared/api';
import type { Auth } from '../auth/lucia';
import { anyMember, requireTeam, requireUser } from '../http/access';
import { auditWho, requestIp } from '../http/audit-who';
import { HttpError } from '../http/errors';
import { route, type RouteSpec } from '../http/route-table';
import { body } from '../http/validate';
import { changePassword, confirmSignUp, mailQueued, me, previewSignUp, requestReset, requestSignUp, resetPassword, signIn, signOut, signOutEverywhere, type AccountDeps } from '../services/account-service';
import { acceptInvitation, previewInvitation } from '../services/team-service';

function startSession(auth: Auth, res: Response, sessionId: string): void {
  res.append('Set-Cookie', auth.createSessionCookie(sessionId).serialize());
}

function endSession(auth: Auth, res: Response): void {
  res.append('Set-Cookie', auth.createBlankSessionCookie().serialize()).status(204).end();
}

/**
 * Sign-up, sign-in, resets, invitations and one's own sessions. Every
 * anonymous route that costs work is rate-limited (server/auth/limits.ts);
 * the ones that mail answer the same for every address at once (the mail
 * leaves from a worker).
 */
export function authRoutes(d: AccountDeps): RouteSpec[] {
  return [
    route('post', '/auth/sign-up', 'public', body(signUpRequestSchema), async (req, res) => {
      await requestSignUp(d, res.locals.body, requestIp(req));
      res.status(202).json({ message: mailQueued.signUp });
    }),
    route('get', '/sign-up/:token', 'public', async (req, res) => {
      res.json(await previewSignUp(d, String(req.params.token), requestIp(req)));
    }),
    route('post', '/auth/sign-up/confirm', 'public', body(signUpConfirmSchema), async (req, res) => {
      const { userId, sessionId } = await confirmSignUp(d, res.locals.body, requestIp(req));
      startSession(d.auth, res, sessionId);
      res.status(201).json(await me(d.ds, userId));
    }),
    route('post', '/auth/sign-in', 'public', body(signInRequestSchema), async (req, res) => {
      const { sessionId } = await signIn(d, res.locals.body, requestIp(req));
      const { user } = await d.auth.validateSession(sessionId);
      if (!user) throw new HttpError(401, 'Sign in again: the session ended at once.', undefined, 'Unauthorized');
      startSession(d.auth, res, sessionId);
      res.json(await me(d.ds, user.id));
    }),
    route('post', '/auth/sign-out', anyMember, async (req, res) => {
      if (req.auth) await signOut(d, { id: req.auth.session.id, userId: req.auth.user.id }, requireTeam(req).id);
      endSession(d.auth, res);
    }),
    route('post', '/auth/sign-out-everywhere', anyMember, async (req, res) => {
      await signOutEverywhere(d, { ...auditWho(req), actorId: requireUser(req).id, teamId: requireTeam(req).id });
      endSession(d.auth, res);
    }),
    route('post', '/auth/password', anyMember, body(changePasswordSchema), async (req, res) => {
      await changePassword(d, { ...auditWho(req), actorId: requireUser(req).id }, req.auth!.session.id, res.locals.body);
      res.status(204).end();
    }),
    route('get', '/auth/me', anyMember, async (req, res) => {
      res.json(await me(d.ds, requireUser(req).id));
    }),
    route('post', '/auth/reset-request', 'public', body(resetRequestSchema), async (req, res) => {
      await requestReset(d, res.locals.body.email, requestIp(req));
      res.status(202).json({ message: mailQueued.reset });
    }),
    route('post', '/auth/reset', 'public', body(resetConfirmSchema), async (req, res) => {
      await resetPassword(d, res.locals.body, requestIp(req));
      res.status(204).end();
    }),
    route('get', '/invitations/:token', 'public', async (req, res) => {
      res.json(await previewInvitation(d.ds, String(req.params.token), requestIp(req)));
    }),
    route('post', '/invitations/accept', 'public', body(acceptInvitationSchema), async (req, res) => {
      const { sessionId } = await acceptInvitation(d, res.locals.body, requestIp(req));
      const { user } = await d.auth.validateSession(sessionId);
      if (!user) throw new HttpError(401, 'Sign in again: the session ended at once.', undefined, 'Unauthorized');
      startSession(d.auth, res, sessionId);
      res.status(201).json(await me(d.ds, user.id));
    }),
  ];
}
