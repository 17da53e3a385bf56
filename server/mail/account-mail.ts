import type { DataSource } from 'typeorm';
import type { AccountMailJob } from '../../shared/api/account-mail';
import { newToken } from '../auth/tokens';
import { AppUser, PasswordReset, SignUpRequest } from '../db/entities';
import { activeByEmail } from '../services/active-accounts';
import type { Mailer } from './mailer';
import { invitationMail, invitationTakenMail, passwordChangedMail, resetMail, signUpLinkMail, signUpTakenMail } from './templates';

export type AccountMailDeps = { ds: DataSource; mailer: Mailer; appOrigin: string };

/** How long the links stay usable. */
export const linkLifetimes = { signUpHours: 24, resetMinutes: 60 } as const;

type Outcome = string;

const owner = (d: AccountMailDeps, email: string) => activeByEmail(d.ds.manager, email).getOne();

/**
 * What an address gets for an account request, decided here in a worker and
 * never in the request: the request answered the same for every address, and
 * only the owner of the mailbox learns whether it has an account. A token is
 * made here and only its hash stored; a retried job makes a new one (the old
 * one was never mailed, so nobody holds it).
 */
export async function sendAccountMail(d: AccountMailDeps, job: AccountMailJob): Promise<Outcome> {
  switch (job.kind) {
    case 'sign-up': return signUp(d, job);
    case 'reset': return reset(d, job.email);
    case 'invitation': return invitation(d, job.invitationId);
    case 'password-changed': return passwordChanged(d, job.userId, job.how);
  }
}

async function signUp(d: AccountMailDeps, job: Extract<AccountMailJob, { kind: 'sign-up' }>): Promise<Outcome> {
  const account = await owner(d, job.email);
  if (account) {
    await d.mailer.send(signUpTakenMail(account.email, { signIn: `${d.appOrigin}/sign-in`, reset: `${d.appOrigin}/forgot-password` }));
    return 'sign-up for an address with an account: its owner was told';
  }
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + linkLifetimes.signUpHours * 3600 * 1000);
  await d.ds.getRepository(SignUpRequest).insert({ email: job.email, displayName: job.displayName, teamName: job.teamName, tokenHash: hash, expiresAt, usedAt: null });
  await d.mailer.send(signUpLinkMail(job.email, { teamName: job.teamName, link: `${d.appOrigin}/confirm-sign-up?token=${token}`, expiresAt }));
  // Spent and expired requests serve nothing; trimmed here now and then.
  if (Math.random() < 0.05) await d.ds.query(`DELETE FROM sign_up_request WHERE expires_at < now() - interval '7 days'`);
  return 'sign-up link sent';
}

async function reset(d: AccountMailDeps, email: string): Promise<Outcome> {
  const account = await owner(d, email);
  if (!account) return 'reset for an address without an account: nothing sent';
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + linkLifetimes.resetMinutes * 60 * 1000);
  await d.ds.getRepository(PasswordReset).insert({ userId: account.id, tokenHash: hash, expiresAt, usedAt: null });
  await d.mailer.send(resetMail(account.email, { link: `${d.appOrigin}/reset-password?token=${token}`, expiresAt }));
  return 'reset link sent';
}

type PendingInvitation = { id: string; email: string; role: string; team_id: string; team_name: string; inviter: string | null; expires_at: Date };

async function invitation(d: AccountMailDeps, id: string): Promise<Outcome> {
  const [inv]: PendingInvitation[] = await d.ds.query(
    `SELECT i.id, i.email, i.role, i.team_id, t.name AS team_name, u.display_name AS inviter, i.expires_at
     FROM invitation i JOIN team t ON t.id = i.team_id LEFT JOIN app_user u ON u.id = i.invited_by
     WHERE i.id = $1 AND i.accepted_at IS NULL AND i.revoked_at IS NULL AND i.expires_at > now()`, [id]);
  if (!inv) return 'invitation no longer pending: nothing sent';
  const inviter = inv.inviter ?? 'An admin';
  const account = await owner(d, inv.email);
  if (account) {
    await d.mailer.send(invitationTakenMail(account.email, { teamName: inv.team_name, inviter, sameTeam: account.teamId === inv.team_id, signIn: `${d.appOrigin}/sign-in` }));
    return 'invitation to an address with an account: its owner was told';
  }
  // The request stored the hash of a token nobody holds; the mailed one replaces it.
  const { token, hash } = newToken();
  const [, updated]: [unknown, number] = await d.ds.query(
    'UPDATE invitation SET token_hash = $2 WHERE id = $1 AND accepted_at IS NULL AND revoked_at IS NULL', [inv.id, hash]);
  if (!updated) return 'invitation revoked meanwhile: nothing sent';
  await d.mailer.send(invitationMail(inv.email, { teamName: inv.team_name, inviter, role: inv.role, link: `${d.appOrigin}/join?token=${token}`, expiresAt: new Date(inv.expires_at) }));
  return 'invitation link sent';
}

async function passwordChanged(d: AccountMailDeps, userId: string, how: 'changed' | 'reset'): Promise<Outcome> {
  const account = await d.ds.getRepository(AppUser).findOneBy({ id: userId });
  if (!account || account.removedAt) return 'account gone: nothing sent';
  await d.mailer.send(passwordChangedMail(account.email, { how, reset: `${d.appOrigin}/forgot-password` }));
  return 'password change notice sent';
}
