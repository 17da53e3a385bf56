import type { ReactNode } from 'react';
import { ReadOnlyNotice } from '@/components/auth/read-only-notice';
import { useRole } from '@/components/auth/session';

/**
 * Shows its children only to members who may change families; everyone else
 * (e.g. someone following a shared link) reads why not. The API refuses too.
 */
export function FamilyWriteGuard({ children }: { children: ReactNode }) {
  const { can } = useRole();
  if (can('families.write')) return <>{children}</>;
  return <ReadOnlyNotice what="Creating, editing and uploading material families" />;
}
