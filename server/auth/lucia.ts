import { NodePostgresAdapter } from '@lucia-auth/adapter-postgresql';
import { Lucia, TimeSpan, type DatabaseSession, type DatabaseUser } from 'lucia';
import type { Pool } from 'pg';
import type { Role } from '../../shared/api/auth';

/**
 * A session of a removed member has no user: lucia then deletes it and answers
 * "signed out". Removal deletes the sessions too; this also refuses one that a
 * sign-in racing the removal wrote just after.
 */
class ActiveMembersAdapter extends NodePostgresAdapter {
  override async getSessionAndUser(sessionId: string): Promise<[DatabaseSession | null, DatabaseUser | null]> {
    const [session, user] = await super.getSessionAndUser(sessionId);
    return [session, user && user.attributes.removed_at === null ? user : null];
  }
}

/**
 * lucia v3 sessions in PostgreSQL. Sessions last 30 days and are extended by
 * lucia when half-way to expiry (the `fresh` flag), so active users stay in.
 */
export function createLucia(pool: Pool, secureCookie: boolean) {
  return new Lucia(new ActiveMembersAdapter(pool, { user: 'app_user', session: 'user_session' }), {
    sessionExpiresIn: new TimeSpan(30, 'd'),
    sessionCookie: { name: 'frostgrade_session', attributes: { secure: secureCookie, sameSite: 'lax' } },
    getUserAttributes: (a) => ({ teamId: a.team_id, role: a.role, email: a.email, displayName: a.display_name }),
  });
}

export type Auth = ReturnType<typeof createLucia>;

declare module 'lucia' {
  interface Register {
    Lucia: Auth;
    DatabaseUserAttributes: { team_id: string; role: Role; email: string; display_name: string; removed_at: Date | null };
  }
}
