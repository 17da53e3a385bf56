import type { ReactNode } from 'react';
import { useRole } from '@/components/auth/session';
import { roleLabels } from '@/components/auth/permissions';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';

/**
 * Shows its children only to members who may change families; everyone else
 * (e.g. someone following a shared link) reads why not. The API refuses too.
 */
export function FamilyWriteGuard({ children }: { children: ReactNode }) {
  const { can, role } = useRole();
  if (can('families.write')) return <>{children}</>;
  return (
    <Notice tone="info" title="Read-only for your role" testID="write-guard">
      <AppText>
        {`Creating, editing and uploading material families is for physicists and admins${role ? `; you are signed in as ${roleLabels[role].toLowerCase()}` : ''}.`}
      </AppText>
    </Notice>
  );
}
