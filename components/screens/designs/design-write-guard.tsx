import type { ReactNode } from 'react';
import { ReadOnlyNotice } from '@/components/auth/read-only-notice';
import { useRole } from '@/components/auth/session';

/** Shows its children only to members who may change designs; others read why not (the API refuses too). */
export function DesignWriteGuard({ children }: { children: ReactNode }) {
  const { can } = useRole();
  if (can('designs.write')) return <>{children}</>;
  return <ReadOnlyNotice what="Creating and editing designs" />;
}
