import { createContext, useContext, useMemo, type ReactNode } from 'react';
import type { MeResponse, Role } from '@/shared/api/auth';
import { roleCan, type Action } from './permissions';

/** The signed-in member and team, or null when nobody is signed in. */
export type Session = MeResponse | null;

const SessionContext = createContext<Session>(null);

/** Provided once by the auth gate in the root layout (and by tests). */
export function SessionProvider({ session, children }: { session: Session; children: ReactNode }) {
  return <SessionContext.Provider value={session}>{children}</SessionContext.Provider>;
}

/** Who is signed in, or null. */
export function useSession(): Session {
  return useContext(SessionContext);
}

export type RoleInfo = {
  /** The member's role in their team, or null when signed out. */
  role: Role | null;
  /** Whether the signed-in member may take this action (false when signed out). */
  can: (action: Action) => boolean;
};

/**
 * The current role and a `can(action)` check for hiding what the role may
 * not do — no dead buttons. See `permissions.ts` for the actions.
 */
export function useRole(): RoleInfo {
  const session = useSession();
  const role = session?.user.role ?? null;
  return useMemo(() => ({ role, can: (action: Action) => roleCan(role, action) }), [role]);
}

/** Renders its children only when the signed-in member may take `action`. */
export function Can({ action, children }: { action: Action; children: ReactNode }) {
  const { can } = useRole();
  return can(action) ? <>{children}</> : null;
}
