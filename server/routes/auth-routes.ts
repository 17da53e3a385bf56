import type { Request, Response } from 'express';
import { acceptInvitationSchema, resetConfirmSchema, resetRequestSchema, signInRequestSchema, signUpRequestSchema } from '../../shared/api';
import type { Auth } from '../auth/lucia';
import { anyMember, requireUser } from '../http/access';
import { route, type RouteSpec } from '../http/route-table';
import { body } from '../http/validate';
import { me, requestReset, resetPassword, signIn, signUp, type AccountDeps } from '../services/account-service';
import { acceptInvitation, previewInvitation } from '../services/team-service';

function startSession(auth: Auth, res: Response, sessionId: string): void {
  res.append('Set-Cookie', auth.createSessionCookie(sessionId).serialize());
}

const ip = (req: Request): string => req.ip ?? 'unknown';

export function authRoutes(d: AccountDeps): RouteSpec[] {
  return [
    route('post', '/auth/sign-up', 'public', body(signUpRequestSchema), async (_req, res) => {
      const { userId, sessionId } = await signUp(d, res.locals.body);
      startSession(d.auth, res, sessionId);
      res.status(201).json(await me(d.ds, userId));
    }),
    route('post', '/auth/sign-in', 'public', body(signInRequestSchema), async (req, res) => {
      const { sessionId } = await signIn(d, res.locals.body, ip(req));
      const { user } = await d.auth.validateSession(sessionId);
      startSession(d.auth, res, sessionId);
      res.json(await me(d.ds, user!.id));
    }),
    route('post', '/auth/sign-out', anyMember, async (req, res) => {
      if (req.auth) await d.auth.invalidateSession(req.auth.session.id);
      res.append('Set-Cookie', d.auth.createBlankSessionCookie().serialize()).status(204).end();
    }),
    route('get', '/auth/me', anyMember, async (req, res) => {
      res.json(await me(d.ds, requireUser(req).id));
    }),
    route('post', '/auth/reset-request', 'public', body(resetRequestSchema), async (req, res) => {
      await requestReset(d, res.locals.body.email, ip(req));
      res.status(202).json({ message: 'If an account uses this address, a reset link is on its way.' });
    }),
    route('post', '/auth/reset', 'public', body(resetConfirmSchema), async (_req, res) => {
      await resetPassword(d, res.locals.body);
      res.status(204).end();
    }),
    route('get', '/invitations/:token', 'public', async (req, res) => {
      res.json(await previewInvitation(d.ds, String(req.params.token)));
    }),
    route('post', '/invitations/accept', 'public', body(acceptInvitationSchema), async (_req, res) => {
      const { sessionId } = await acceptInvitation(d, res.locals.body);
      const { user } = await d.auth.validateSession(sessionId);
      startSession(d.auth, res, sessionId);
      res.status(201).json(await me(d.ds, user!.id));
    }),
  ];
}
