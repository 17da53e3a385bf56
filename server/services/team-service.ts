import { randomBytes } from 'node:crypto';
import { IsNull, type DataSource, type EntityManager } from 'typeorm';
import type { InvitationPreview, Member, Role, TeamResponse } from '../../shared/api';
import type { Auth } from '../auth/lucia';
import { hashPassword } from '../auth/passwords';
import { hashToken, newToken } from '../auth/tokens';
import { AppUser, Invitation, Team } from '../db/entities';
import { HttpError, NotFoundError, ValidationError } from '../http/errors';
import { isUuid } from '../http/validate';
import type { Mailer } from '../mail/mailer';
import { invitationMail } from '../mail/templates';
import { announceAccountEnded } from '../realtime/session-end';
import { activeByEmail } from './active-accounts';

const INVITE_DAYS = 7;

export type TeamDeps = { ds: DataSource; auth: Auth; mailer: Mailer; appOrigin: string };

function stateOf(i: Invitation): 'pending' | 'accepted' | 'revoked' | 'expired' {
  if (i.acceptedAt) return 'accepted';
  if (i.revokedAt) return 'revoked';
  return i.expiresAt.getTime() < Date.now() ? 'expired' : 'pending';
}

export async function teamOverview(ds: DataSource, team: Team): Promise<TeamResponse> {
  const everyone = await ds.getRepository(AppUser).find({ where: { teamId: team.id }, order: { createdAt: 'ASC' } });
  const members = everyone.filter((u) => u.removedAt === null);
  const invitations = await ds.getRepository(Invitation).find({ where: { teamId: team.id }, order: { createdAt: 'DESC' }, take: 100 });
  // Invitations are history: one sent by a member since removed keeps their name.
  const names = new Map(everyone.map((m) => [m.id, m.displayName]));
  return {
    members: members.map((m): Member => ({ id: m.id, email: m.email, displayName: m.displayName, role: m.role, joinedAt: m.createdAt.toISOString() })),
    invitations: invitations.map((i) => ({
      id: i.id, email: i.email, role: i.role, invitedBy: names.get(i.invitedBy) ?? 'a former member',
      createdAt: i.createdAt.toISOString(), expiresAt: i.expiresAt.toISOString(), state: stateOf(i),
    })),
  };
}

export async function invite(d: TeamDeps, team: Team, inviter: { id: string; displayName: string }, email: string, role: Role): Promise<void> {
  if (await activeByEmail(d.ds.manager, email).getExists()) {
    throw new ValidationError([{ field: 'email', message: 'this address already has a Frostgrade account (one team per account)' }]);
  }
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + INVITE_DAYS * 24 * 3600 * 1000);
  await d.ds.getRepository(Invitation).insert({ teamId: team.id, email, role, tokenHash: hash, invitedBy: inviter.id, expiresAt, acceptedAt: null, revokedAt: null });
  await d.mailer.send(invitationMail(email, { teamName: team.name, inviter: inviter.displayName, role, link: `${d.appOrigin}/join?token=${token}`, expiresAt }));
}

export async function revokeInvitation(ds: DataSource, team: Team, id: unknown): Promise<void> {
  if (!isUuid(id)) throw new NotFoundError('invitation');
  const r = await ds.getRepository(Invitation).createQueryBuilder().update().set({ revokedAt: () => 'now()' })
    .where('id = :id AND team_id = :team AND accepted_at IS NULL AND revoked_at IS NULL', { id, team: team.id }).execute();
  if (!r.affected) throw new NotFoundError('pending invitation');
}

async function usableInvitation(ds: DataSource, token: string): Promise<Invitation> {
  const inv = await ds.getRepository(Invitation).findOneBy({ tokenHash: hashToken(token) });
  if (!inv || stateOf(inv) !== 'pending') throw new ValidationError([{ field: 'token', message: 'this invitation link is invalid, used, revoked or expired: ask your admin for a new one' }]);
  return inv;
}

export async function previewInvitation(ds: DataSource, token: string): Promise<InvitationPreview> {
  const inv = await usableInvitation(ds, token);
  const team = await ds.getRepository(Team).findOneByOrFail({ id: inv.teamId });
  return { email: inv.email, role: inv.role, teamName: team.name, expiresAt: inv.expiresAt.toISOString() };
}

/** Creates the account in the inviting team; the token works once. */
export async function acceptInvitation(d: TeamDeps, input: { token: string; password: string; displayName: string }): Promise<{ sessionId: string }> {
  const passwordHash = await hashPassword(input.password);
  const userId = await d.ds.transaction(async (m) => {
    const inv = await m.getRepository(Invitation).createQueryBuilder('i').setLock('pessimistic_write').where('i.tokenHash = :h', { h: hashToken(input.token) }).getOne();
    if (!inv || stateOf(inv) !== 'pending') throw new ValidationError([{ field: 'token', message: 'this invitation link is invalid, used, revoked or expired: ask your admin for a new one' }]);
    if (await activeByEmail(m, inv.email).getExists()) {
      throw new ValidationError([{ field: 'token', message: 'this address already has an account: sign in instead' }]);
    }
    const id = randomBytes(15).toString('base64url');
    await m.getRepository(AppUser).insert({ id, teamId: inv.teamId, email: inv.email, displayName: input.displayName, passwordHash, role: inv.role });
    await m.getRepository(Invitation).update({ id: inv.id }, { acceptedAt: new Date() });
    return id;
  });
  return { sessionId: (await d.auth.createSession(userId, {})).id };
}


/** The team must keep an admin: the last one can be neither demoted nor removed. */
async function assertAdminRemains(m: EntityManager, team: Team, member: AppUser, nextRole: Role | null): Promise<void> {
  if (member.role !== 'admin' || nextRole === 'admin') return;
  const admins = await m.getRepository(AppUser).countBy({ teamId: team.id, role: 'admin', removedAt: IsNull() });
  if (admins <= 1) throw new HttpError(409, 'The team needs at least one admin: make someone else admin first.', [{ field: 'role', message: 'last admin' }], 'Conflict');
}

async function memberOf(m: EntityManager, team: Team, id: string): Promise<AppUser> {
  const member = await m.getRepository(AppUser).findOneBy({ id, teamId: team.id, removedAt: IsNull() });
  if (!member) throw new NotFoundError('member');
  return member;
}

/** A new role applies to the next request at once; open sockets reconnect to carry it. */
export async function changeRole(d: Pick<TeamDeps, 'ds'>, team: Team, id: string, role: Role): Promise<void> {
  await d.ds.transaction(async (m) => {
    await m.query('SELECT pg_advisory_xact_lock(hashtext($1))', [`team-admins:${team.id}`]);
    const member = await memberOf(m, team, id);
    await assertAdminRemains(m, team, member, role);
    if (member.role === role) return;
    await m.getRepository(AppUser).update({ id: member.id }, { role });
    await announceAccountEnded(m, team.id, { userId: member.id, reason: 'role' });
  });
}

/**
 * Soft removal: the account row stays, so runs, releases, uploads and growth
 * events keep the person's name; it no longer signs in, owns its address,
 * follows designs or receives mail, and its sessions and sockets end now.
 */
export async function removeMember(d: Pick<TeamDeps, 'ds'>, team: Team, id: string): Promise<void> {
  await d.ds.transaction(async (m) => {
    await m.query('SELECT pg_advisory_xact_lock(hashtext($1))', [`team-admins:${team.id}`]);
    const member = await memberOf(m, team, id);
    await assertAdminRemains(m, team, member, null);
    await m.getRepository(AppUser).update({ id: member.id }, { removedAt: () => 'now()' });
    await m.query('DELETE FROM design_follower WHERE user_id = $1', [member.id]);
    await m.query('UPDATE password_reset SET used_at = now() WHERE user_id = $1 AND used_at IS NULL', [member.id]);
    await m.query('DELETE FROM user_session WHERE user_id = $1', [member.id]);
    await announceAccountEnded(m, team.id, { userId: member.id, reason: 'removed' });
  });
}
