import { randomBytes } from 'node:crypto';
import { IsNull, type DataSource } from 'typeorm';
import type { z } from 'zod';
import type { MeResponse, resetConfirmSchema, signInRequestSchema, signUpRequestSchema } from '../../shared/api';
import type { Auth } from '../auth/lucia';
import { hashPassword, spendVerifyTime, verifyPassword } from '../auth/passwords';
import { consume } from '../auth/rate-limit';
import { hashToken, newToken } from '../auth/tokens';
import { AppUser, PasswordReset, Team } from '../db/entities';
import { HttpError, ValidationError } from '../http/errors';
import type { Mailer } from '../mail/mailer';
import { resetMail } from '../mail/templates';
import { activeByEmail } from './active-accounts';

export type AccountDeps = { ds: DataSource; auth: Auth; mailer: Mailer; appOrigin: string };

const RESET_MINUTES = 60;

function slugify(name: string): string {
  const base = name.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 40) || 'team';
  return `${base}-${randomBytes(3).toString('hex')}`;
}

export async function me(ds: DataSource, userId: string): Promise<MeResponse> {
  const user = await ds.getRepository(AppUser).findOneByOrFail({ id: userId });
  const team = await ds.getRepository(Team).findOneByOrFail({ id: user.teamId });
  return { user: { id: user.id, email: user.email, displayName: user.displayName, role: user.role }, team: { id: team.id, name: team.name } };
}

/** A new account always brings a new team, whose first member is its admin. */
export async function signUp(d: AccountDeps, input: z.output<typeof signUpRequestSchema>): Promise<{ userId: string; sessionId: string }> {
  const passwordHash = await hashPassword(input.password);
  const userId = await d.ds.transaction(async (m) => {
    if (await activeByEmail(m, input.email).getExists()) {
      throw new ValidationError([{ field: 'email', message: 'an account with this e-mail exists already: sign in, or reset its password' }]);
    }
    const team = await m.getRepository(Team).save(m.getRepository(Team).create({ name: input.teamName, slug: slugify(input.teamName) }));
    const id = randomBytes(15).toString('base64url');
    await m.getRepository(AppUser).insert({ id, teamId: team.id, email: input.email, displayName: input.displayName, passwordHash, role: 'admin' });
    return id;
  });
  const session = await d.auth.createSession(userId, {});
  return { userId, sessionId: session.id };
}

/** One answer for an unknown e-mail and a wrong password, in the same time. */
export async function signIn(d: AccountDeps, input: z.output<typeof signInRequestSchema>, ip: string): Promise<{ sessionId: string }> {
  await consume(d.ds, [
    { key: `signin:account:${input.email}`, max: 8, windowSeconds: 15 * 60 },
    { key: `signin:address:${ip}`, max: 40, windowSeconds: 15 * 60 },
  ]);
  const user = await activeByEmail(d.ds.manager, input.email).addSelect('u.passwordHash').getOne();
  const ok = user ? await verifyPassword(user.passwordHash, input.password) : (await spendVerifyTime(input.password), false);
  if (!user || !ok) throw new HttpError(400, 'E-mail or password is wrong.', [{ field: 'password', message: 'e-mail or password is wrong' }], 'SignInFailed');
  const session = await d.auth.createSession(user.id, {});
  return { sessionId: session.id };
}

/** Always answers the same way; mails a link only when the account exists. */
export async function requestReset(d: AccountDeps, email: string, ip: string): Promise<void> {
  await consume(d.ds, [
    { key: `reset:account:${email}`, max: 3, windowSeconds: 60 * 60 },
    { key: `reset:address:${ip}`, max: 20, windowSeconds: 60 * 60 },
  ]);
  const user = await activeByEmail(d.ds.manager, email).getOne();
  if (!user) return;
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + RESET_MINUTES * 60 * 1000);
  await d.ds.getRepository(PasswordReset).insert({ userId: user.id, tokenHash: hash, expiresAt, usedAt: null });
  await d.mailer.send(resetMail(user.email, { link: `${d.appOrigin}/reset-password?token=${token}`, expiresAt }));
}

/** Single use: the token is marked used and every session of the account ends. */
export async function resetPassword(d: AccountDeps, input: z.output<typeof resetConfirmSchema>): Promise<void> {
  const passwordHash = await hashPassword(input.password);
  const userId = await d.ds.transaction(async (m) => {
    const reset = await m.getRepository(PasswordReset).createQueryBuilder('r').setLock('pessimistic_write')
      .where('r.tokenHash = :h', { h: hashToken(input.token) }).getOne();
    // Removal spends a member's open links; this also refuses one a request racing the removal wrote.
    const active = reset ? await m.getRepository(AppUser).existsBy({ id: reset.userId, removedAt: IsNull() }) : false;
    if (!reset || !active || reset.usedAt || reset.expiresAt.getTime() < Date.now()) {
      throw new ValidationError([{ field: 'token', message: 'this reset link is invalid, used or expired: ask for a new one' }]);
    }
    await m.getRepository(PasswordReset).update({ id: reset.id }, { usedAt: new Date() });
    await m.getRepository(AppUser).update({ id: reset.userId }, { passwordHash });
    return reset.userId;
  });
  await d.auth.invalidateUserSessions(userId);
}
