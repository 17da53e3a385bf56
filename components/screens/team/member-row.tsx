import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Member } from '@/shared/api/auth';
import { useRemoveMember } from '@/components/api/team';
import { FormAlert } from '@/components/auth/form/form-alert';
import { errorsFrom } from '@/components/auth/form/form-errors';
import { Initials } from '@/components/auth/initials';
import { RoleBadge } from '@/components/auth/role-badge';
import { formatDay } from '@/components/format/date';
import { colors, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { ConfirmBox } from '@/components/ui/confirm-box';
import { MemberRoleEditor } from './member-role-editor';
import { RowButton } from '@/components/ui/row-button';

type Mode = 'view' | 'role' | 'remove';

export type MemberRowProps = {
  member: Member;
  isYou: boolean;
  /** Admins see "Change role" and "Remove". */
  manage: boolean;
};

function RemoveStep({ member, onCancel }: { member: Member; onCancel: () => void }) {
  const remove = useRemoveMember();
  const problem = remove.isError ? errorsFrom(remove.error, []).banner : null;
  return (
    <>
      <ConfirmBox
        question={`Remove ${member.displayName} from the team?`}
        consequence={`${member.displayName} is signed out everywhere at once and no longer gets Frostgrade mail. Their runs, releases, uploads and growth steps stay with the team under their name; their address can be invited again.`}
        confirmLabel={`Remove ${member.displayName}`}
        busyLabel="Removing…"
        busy={remove.isPending}
        onConfirm={() => remove.mutate(member.id)}
        onCancel={onCancel}
        testID="confirm-remove"
      />
      {problem ? (
        <FormAlert tone="danger" title="Not removed" testID="remove-problem">
          {problem}
        </FormAlert>
      ) : null}
    </>
  );
}

/** One member: name, e-mail, role, joined; for admins, change role and remove (confirmed). */
export function MemberRow({ member, isYou, manage }: MemberRowProps) {
  const [mode, setMode] = useState<Mode>('view');
  const view = () => setMode('view');
  return (
    <View style={styles.row} role="listitem" aria-label={member.displayName} testID={`member-${member.email}`}>
      <View style={styles.main}>
        <Initials name={member.displayName} size={36} />
        <View style={styles.who}>
          <View style={styles.nameLine}>
            <AppText variant="bodyStrong" style={styles.name}>
              {member.displayName}
              {isYou ? <AppText tone="muted">{' · you'}</AppText> : null}
            </AppText>
            <RoleBadge role={member.role} />
          </View>
          <AppText tone="muted">{member.email}</AppText>
          <AppText variant="caption" tone="faint">
            Joined {formatDay(member.joinedAt)}
          </AppText>
        </View>
      </View>
      {manage && mode === 'view' ? (
        <View style={styles.actions}>
          <RowButton label="Change role" accessibilityLabel={`Change role of ${member.displayName}`} onPress={() => setMode('role')} testID="change-role" />
          {isYou ? null : (
            <RowButton label="Remove" accessibilityLabel={`Remove ${member.displayName}`} onPress={() => setMode('remove')} testID="remove-member" />
          )}
        </View>
      ) : null}
      {manage && mode === 'role' ? <MemberRoleEditor member={member} onDone={view} /> : null}
      {manage && mode === 'remove' ? <RemoveStep member={member} onCancel={view} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    gap: spacing.md,
    paddingVertical: spacing.md,
    borderTopWidth: 1,
    borderTopColor: colors.border,
  },
  main: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.md },
  who: { flex: 1, gap: spacing.xxs },
  nameLine: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.sm },
  name: { flex: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, paddingLeft: 36 + spacing.md },
});
