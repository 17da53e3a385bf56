import { randomBytes } from 'node:crypto';
import type PgBoss from 'pg-boss';
import { IsNull, type DataSource, type EntityManager } from 'typeorm';
import type { InvitationPreview, Member, Role, TeamResponse } from '../../shared/api';
import { recordAudit, type AuditWho } from '../audit/audit-log';
import { anonymousLimits } from '../auth/limits';
import type { Auth } from '../auth/lucia';
import { hashPassword } from '../auth/passwords';
import { consume } from '../auth/rate-limit';
import { hashToken, newToken } from '../auth/tokens';
import { AppUser, Invitation, Team } from '../db/entities';
import { HttpError, NotFoundError, ValidationError } from '../http/errors';
import { isUuid } from '../http/validate';
import { enqueueAccountMail } from '../queue/account-mail-queue';
import { announceAccountEnded } from '../realtime/session-end';
import { activeByEmail } from './active-accounts';
import { checkInvitationLimits } from './invitation-limits';

const INVITE_DAYS = 7;

export type TeamDeps = { ds: DataSource; auth: Auth; boss: PgBoss; appOrigin: string };

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

/**
 * The same for every address, so an admin cannot learn who has an account:
 * the invitation is listed as pending and a worker mails either its link or,
 * to an address that has an account, a note to its owner. The team's limits
 * are checked under a per-team lock, so racing invitations cannot pass them.
 */
export async function invite(d: TeamDeps, team: Team, who: AuditWho & { actorId: string }, email: string, role: Role): Promise<void> {
  await d.ds.transaction(async (m) => {
    await m.query('SELECT pg_advisory_xact_lock(hashtext($1))', [`team-invitations:${team.id}`]);
    await checkInvitationLimits(m, team.id);
    // A hash of a token nobody holds: the worker stores the one it mails (server/mail/account-mail.ts).
    const placeholder = newToken().hash;
    const expiresAt = new Date(Date.now() + INVITE_DAYS * 24 * 3600 * 1000);
    const [row]: Array<{ id: string }> = await m.query(
      `INSERT INTO invitation (team_id, email, role, token_hash, invited_by, expires_at) VALUES ($1, $2, $3, $4, $5, $6) RETURNING id`,
      [team.id, email, role, placeholder, who.actorId, expiresAt]);
    await enqueueAccountMail(d.boss, { kind: 'invitation', invitationId: row!.id }, m);
    await recordAudit(m, who, { action: 'invitation-sent', summary: `invited ${email} as ${role}`, email, subjectId: row!.id });
  });
}

export async function revokeInvitation(ds: DataSource, team: Team, who: AuditWho, id: unknown): Promise<void> {
  if (!isUuid(id)) throw new NotFoundError('invitation');
  await ds.transaction(async (m) => {
    const [rows]: [Array<{ email: string }>, number] = await m.query(
      `UPDATE invitation SET revoked_at = now() WHERE id = $1 AND team_id = $2 AND accepted_at IS NULL AND revoked_at IS NULL RETURNING email`, [id, team.id]);
    const revoked = rows[0];
    if (!revoked) throw new NotFoundError('pending invitation');
    await recordAudit(m, who, { action: 'invitation-revoked', summary: `revoked the invitation of ${revoked.email}`, email: revoked.email, subjectId: id });
  });
}

async function usableInvitation(m: EntityManager, token: string, lock = false): Promise<Invitation> {
  const qb = m.getRepository(Invitation).createQueryBuilder('i').where('i.tokenHash = :h', { h: hashToken(token) });
  if (lock) qb.setLock('pessimistic_write');
  const inv = await qb.getOne();
  if (!inv || stateOf(inv) !== 'pending') throw new ValidationError([{ field: 'token', message: 'this invitation link is invalid, used, revoked or expired: ask your admin for a new one' }]);
  return inv;
}

export async function previewInvitation(ds: DataSource, token: string, ip: string): Promise<InvitationPreview> {
  await consume(ds, anonymousLimits.linkPreview(ip));
  const inv = await usableInvitation(ds.manager, token);
  const team = await ds.getRepository(Team).findOneByOrFail({ id: inv.teamId });
  return { email: inv.email, role: inv.role, teamName: team.name, expiresAt: inv.expiresAt.toISOString() };
}

/**
 * Creates the account in the inviting team; the link works once. It is
 * checked before the password is hashed, so a bad link costs no hashing.
 */
export async function acceptInvitation(d: TeamDeps, input: { token: string; password: string; displayName: string }, ip: string): Promise<{ sessionId: string }> {
  await consume(d.ds, anonymousLimits.invitationAccept(ip));
  await usableInvitation(d.ds.manager, input.token);
  const passwordHash = await hashPassword(input.password);
  const userId = await d.ds.transaction(async (m) => {
    const inv = await usableInvitation(m, input.token, true);
    if (await activeByEmail(m, inv.email).getExists()) {
      throw new ValidationError([{ field: 'token', message: 'this address already has an account: sign in instead' }]);
    }
    const id = randomBytes(15).toString('base64url');
    await m.getRepository(AppUser).insert({ id, teamId: inv.teamId, email: inv.email, displayName: input.displayName, passwordHash, role: inv.role });
    await m.getRepository(Invitation).update({ id: inv.id }, { acceptedAt: new Date() });
    await recordAudit(m, { teamId: inv.teamId, actorId: id, actorName: input.displayName, ip }, { action: 'invitation-accepted', summary: `joined the team as ${inv.role}`, email: inv.email, subjectId: inv.id });
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
export async function changeRole(d: Pick<TeamDeps, 'ds'>, team: Team, who: AuditWho, id: string, role: Role): Promise<void> {
  await d.ds.transaction(async (m) => {
    await m.query('SELECT pg_advisory_xact_lock(hashtext($1))', [`team-admins:${team.id}`]);
    const member = await memberOf(m, team, id);
    await assertAdminRemains(m, team, member, role);
    if (member.role === role) return;
    await m.getRepository(AppUser).update({ id: member.id }, { role });
    await announceAccountEnded(m, team.id, { userId: member.id, reason: 'role' });
    await recordAudit(m, who, { action: 'role-changed', summary: `changed the role of ${member.displayName} from ${member.role} to ${role}`, email: member.email, subjectId: member.id });
  });
}

/**
 * Soft removal: the account row stays, so runs, releases, uploads and growth
 * events keep the person's name; it no longer signs in, owns its address,
 * follows designs or receives mail, and its sessions and sockets end now.
 */
export async function removeMember(d: Pick<TeamDeps, 'ds'>, team: Team, who: AuditWho, id: string): Promise<void> {
  await d.ds.transaction(async (m) => {
    await m.query('SELECT pg_advisory_xact_lock(hashtext($1))', [`team-admins:${team.id}`]);
    const member = await memberOf(m, team, id);
    await assertAdminRemains(m, team, member, null);
    await m.getRepository(AppUser).update({ id: member.id }, { removedAt: () => 'now()' });
    await m.query('DELETE FROM design_follower WHERE user_id = $1', [member.id]);
    await m.query('UPDATE password_reset SET used_at = now() WHERE user_id = $1 AND used_at IS NULL', [member.id]);
    await m.query('DELETE FROM user_session WHERE user_id = $1', [member.id]);
    await announceAccountEnded(m, team.id, { userId: member.id, reason: 'removed' });
    await recordAudit(m, who, { action: 'member-removed', summary: `removed ${member.displayName} (${member.role}) from the team`, email: member.email, subjectId: member.id });
  });
}
