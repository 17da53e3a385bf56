import { roleLabels } from './permissions';
import { useRole } from './session';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';

/**
 * Why a page shows values as text instead of a form: "Saving modules is for
 * physicists and admins; you are signed in as viewer." The API refuses too.
 */
export function ReadOnlyNotice({ what }: { what: string }) {
  const { role } = useRole();
  return (
    <Notice tone="info" title="Read-only for your role" testID="write-guard">
      <AppText>{`${what} is for physicists and admins${role ? `; you are signed in as ${roleLabels[role].toLowerCase()}` : ''}.`}</AppText>
    </Notice>
  );
}
