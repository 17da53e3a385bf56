import type { ReactNode } from 'react';
import { roleLabels } from '@/components/auth/permissions';
import { useRole } from '@/components/auth/session';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';

/** Shows its children only to members who may change designs; others read why not (the API refuses too). */
export function DesignWriteGuard({ children }: { children: ReactNode }) {
  const { can, role } = useRole();
  if (can('designs.write')) return <>{children}</>;
  return (
    <Notice tone="info" title="Read-only for your role" testID="write-guard">
      <AppText>
        {`Creating and editing designs is for physicists and admins${role ? `; you are signed in as ${roleLabels[role].toLowerCase()}` : ''}.`}
      </AppText>
    </Notice>
  );
}
