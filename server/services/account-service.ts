import type PgBoss from 'pg-boss';
import { IsNull, type DataSource, type EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { MeResponse, SignUpPreview, changePasswordSchema, resetConfirmSchema, signInRequestSchema, signUpConfirmSchema, signUpRequestSchema } from '../../shared/api';
import { recordAudit, type AuditWho } from '../audit/audit-log';
import { anonymousLimits } from '../auth/limits';
import type { Auth } from '../auth/lucia';
import { hashPassword, spendVerifyTime, verifyPassword } from '../auth/passwords';
import { consume } from '../auth/rate-limit';
import { hashToken } from '../auth/tokens';
import { AppUser, PasswordReset, SignUpRequest, Team } from '../db/entities';
import { HttpError, ValidationError } from '../http/errors';
import { enqueueAccountMail } from '../queue/account-mail-queue';
import { announceAccountEnded } from '../realtime/session-end';
import { activeByEmail } from './active-accounts';
import { createTeamWithAdmin } from './new-team';

export type AccountDeps = { ds: DataSource; auth: Auth; boss: PgBoss; appOrigin: string };

/** The answers of the anonymous requests that mail: one wording whatever the address. */
export const mailQueued = {
  signUp: 'Check your inbox: we sent a link to finish creating your team to this address. It works once, for 24 hours. If the address already has an account, the e-mail says what to do instead.',
  reset: 'If an account uses this address, a reset link is on its way.',
} as const;

export async function me(ds: DataSource, userId: string): Promise<MeResponse> {
  const user = await ds.getRepository(AppUser).findOneByOrFail({ id: userId });
  const team = await ds.getRepository(Team).findOneByOrFail({ id: user.teamId });
  return { user: { id: user.id, email: user.email, displayName: user.displayName, role: user.role }, team: { id: team.id, name: team.name } };
}

/**
 * Sign-up, step one. Nothing here depends on whether the address has an
 * account: the limits are counted, a job is queued, the same 202 goes back.
 * The worker mails a link, or tells an existing account's owner.
 */
export async function requestSignUp(d: AccountDeps, input: z.output<typeof signUpRequestSchema>, ip: string): Promise<void> {
  await consume(d.ds, anonymousLimits.signUpRequest(input.email, ip));
  await enqueueAccountMail(d.boss, { kind: 'sign-up', ...input });
}

const badSignUpLink = (): ValidationError => new ValidationError([{ field: 'token', message: 'this sign-up link is invalid, used or expired: sign up again for a new one' }]);

async function usableSignUp(m: EntityManager, token: string, lock = false): Promise<SignUpRequest> {
  const qb = m.getRepository(SignUpRequest).createQueryBuilder('s').where('s.tokenHash = :h', { h: hashToken(token) });
  if (lock) qb.setLock('pessimistic_write');
  const r = await qb.getOne();
  if (!r || r.usedAt || r.expiresAt.getTime() < Date.now()) throw badSignUpLink();
  return r;
}

export async function previewSignUp(d: AccountDeps, token: string, ip: string): Promise<SignUpPreview> {
  await consume(d.ds, anonymousLimits.linkPreview(ip));
  const r = await usableSignUp(d.ds.manager, token);
  return { email: r.email, displayName: r.displayName, teamName: r.teamName, expiresAt: r.expiresAt.toISOString() };
}

/**
 * Sign-up, step two: the link (checked first, so a bad one costs a look-up
 * and no hash) and the password make the team, its admin and a session.
 */
export async function confirmSignUp(d: AccountDeps, input: z.output<typeof signUpConfirmSchema>, ip: string): Promise<{ userId: string; sessionId: string }> {
  await consume(d.ds, anonymousLimits.signUpConfirm(ip));
  await usableSignUp(d.ds.manager, input.token);
  const passwordHash = await hashPassword(input.password);
  const userId = await d.ds.transaction(async (m) => {
    const r = await usableSignUp(m, input.token, true);
    // Only the mailbox's owner holds this link, so saying so tells nobody else anything.
    if (await activeByEmail(m, r.email).getExists()) {
      throw new ValidationError([{ field: 'token', message: 'this address has an account already: sign in, or reset its password' }]);
    }
    await m.getRepository(SignUpRequest).update({ id: r.id }, { usedAt: new Date() });
    const { userId: id, teamId } = await createTeamWithAdmin(m, { email: r.email, displayName: r.displayName, teamName: r.teamName, passwordHash });
    await recordAudit(m, { teamId, actorId: id, actorName: r.displayName, ip }, { action: 'team-created', summary: `created the team ${r.teamName}`, email: r.email, subjectId: teamId });
    return id;
  });
  const session = await d.auth.createSession(userId, {});
  return { userId, sessionId: session.id };
}

/** One answer for an unknown e-mail and a wrong password, in the same time; both recorded. */
export async function signIn(d: AccountDeps, input: z.output<typeof signInRequestSchema>, ip: string): Promise<{ sessionId: string }> {
  await consume(d.ds, anonymousLimits.signIn(input.email, ip));
  const user = await activeByEmail(d.ds.manager, input.email).addSelect('u.passwordHash').getOne();
  const ok = user ? await verifyPassword(user.passwordHash, input.password) : (await spendVerifyTime(input.password), false);
  if (!user || !ok) {
    // A wrong password for a member shows in their team's trail; an unknown address in nobody's.
    await recordAudit(d.ds, { teamId: user?.teamId ?? null, actorId: null, actorName: null, ip }, { action: 'sign-in-failed', summary: 'sign-in refused: wrong e-mail or password', email: input.email, subjectId: user?.id ?? null });
    throw new HttpError(400, 'E-mail or password is wrong.', [{ field: 'password', message: 'e-mail or password is wrong' }], 'SignInFailed');
  }
  const session = await d.auth.createSession(user.id, {});
  await recordAudit(d.ds, { teamId: user.teamId, actorId: user.id, actorName: user.displayName, ip }, { action: 'sign-in', summary: 'signed in', email: user.email, subjectId: user.id });
  return { sessionId: session.id };
}

/** Always answers the same way, at once; a worker mails a link only when the account exists. */
export async function requestReset(d: AccountDeps, email: string, ip: string): Promise<void> {
  await consume(d.ds, anonymousLimits.resetRequest(email, ip));
  await enqueueAccountMail(d.boss, { kind: 'reset', email });
}

const badResetLink = (): ValidationError => new ValidationError([{ field: 'token', message: 'this reset link is invalid, used or expired: ask for a new one' }]);

async function usableReset(m: EntityManager, token: string, lock = false): Promise<PasswordReset> {
  const qb = m.getRepository(PasswordReset).createQueryBuilder('r').where('r.tokenHash = :h', { h: hashToken(token) });
  if (lock) qb.setLock('pessimistic_write');
  const reset = await qb.getOne();
  // Removal spends a member's open links; this also refuses one a request racing the removal wrote.
  const active = reset ? await m.getRepository(AppUser).existsBy({ id: reset.userId, removedAt: IsNull() }) : false;
  if (!reset || !active || reset.usedAt || reset.expiresAt.getTime() < Date.now()) throw badResetLink();
  return reset;
}

/**
 * Every session of the account ends (all but `keep`, the one that asked), its
 * sockets close within the second (NOTIFY at commit), and the owner is mailed.
 */
async function newPasswordTakesOver(m: EntityManager, d: AccountDeps, user: AppUser, how: 'changed' | 'reset', keep: string | null): Promise<void> {
  await m.query('DELETE FROM user_session WHERE user_id = $1 AND id IS DISTINCT FROM $2', [user.id, keep]);
  await announceAccountEnded(m, user.teamId, { userId: user.id, reason: 'password' });
  await enqueueAccountMail(d.boss, { kind: 'password-changed', userId: user.id, how }, m);
}

/** Single use: the link is checked before the new password is hashed, marked used, and every session of the account ends. */
export async function resetPassword(d: AccountDeps, input: z.output<typeof resetConfirmSchema>, ip: string): Promise<void> {
  await consume(d.ds, anonymousLimits.resetConfirm(ip));
  await usableReset(d.ds.manager, input.token);
  const passwordHash = await hashPassword(input.password);
  await d.ds.transaction(async (m) => {
    const reset = await usableReset(m, input.token, true);
    await m.getRepository(PasswordReset).update({ id: reset.id }, { usedAt: new Date() });
    await m.getRepository(AppUser).update({ id: reset.userId }, { passwordHash });
    const user = await m.getRepository(AppUser).findOneByOrFail({ id: reset.userId });
    await newPasswordTakesOver(m, d, user, 'reset', null);
    await recordAudit(m, { teamId: user.teamId, actorId: user.id, actorName: user.displayName, ip }, { action: 'password-reset', summary: 'reset the password through an e-mailed link; every session ended', email: user.email, subjectId: user.id });
  });
}

/** Signed in: the current password proves it is the owner; the other sessions end. */
export async function changePassword(d: AccountDeps, who: AuditWho & { actorId: string }, sessionId: string, input: z.output<typeof changePasswordSchema>): Promise<void> {
  await consume(d.ds, anonymousLimits.passwordChange(who.actorId));
  const user = await d.ds.getRepository(AppUser).createQueryBuilder('u').addSelect('u.passwordHash').where('u.id = :id AND u.removedAt IS NULL', { id: who.actorId }).getOneOrFail();
  if (!(await verifyPassword(user.passwordHash, input.currentPassword))) {
    throw new ValidationError([{ field: 'currentPassword', message: 'this is not your current password' }]);
  }
  const passwordHash = await hashPassword(input.newPassword);
  await d.ds.transaction(async (m) => {
    await m.getRepository(AppUser).update({ id: user.id }, { passwordHash });
    await newPasswordTakesOver(m, d, user, 'changed', sessionId);
    await recordAudit(m, who, { action: 'password-changed', summary: 'changed the password; every other session ended', email: user.email, subjectId: user.id });
  });
}

/** Ends every session of the account, this one too, and closes its sockets. */
export async function signOutEverywhere(d: AccountDeps, who: AuditWho & { actorId: string; teamId: string }): Promise<void> {
  await d.ds.transaction(async (m) => {
    await m.query('DELETE FROM user_session WHERE user_id = $1', [who.actorId]);
    await announceAccountEnded(m, who.teamId, { userId: who.actorId, reason: 'sessions-ended' });
    await recordAudit(m, who, { action: 'signed-out-everywhere', summary: 'signed out everywhere: every session ended', subjectId: who.actorId });
  });
}

/** Ends one session, and the sockets opened with it. */
export async function signOut(d: AccountDeps, session: { id: string; userId: string }, teamId: string): Promise<void> {
  await d.ds.transaction(async (m) => {
    await m.query('DELETE FROM user_session WHERE id = $1', [session.id]);
    await announceAccountEnded(m, teamId, { userId: session.userId, reason: 'signed-out', sessionId: session.id });
  });
}
