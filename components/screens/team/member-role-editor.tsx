import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Member, Role } from '@/shared/api/auth';
import { useChangeRole } from '@/components/api/team';
import { FormAlert } from '@/components/auth/form/form-alert';
import { errorsFrom } from '@/components/auth/form/form-errors';
import { spacing } from '@/components/theme';
import { RolePicker } from './role-picker';
import { RowButton } from '@/components/ui/row-button';

/** Admins: pick a new role for a member; the API refuses (409) to leave the team without an admin. */
export function MemberRoleEditor({ member, onDone }: { member: Member; onDone: () => void }) {
  const [role, setRole] = useState<Role>(member.role);
  const change = useChangeRole();
  const problem = change.isError ? errorsFrom(change.error, []).banner : null;
  const save = () => change.mutate({ memberId: member.id, role }, { onSuccess: onDone });
  return (
    <View style={styles.editor} testID="role-editor">
      <RolePicker
        label={`Role for ${member.displayName}`}
        value={role}
        onChange={(next) => {
          change.reset();
          setRole(next);
        }}
        disabled={change.isPending}
      />
      {problem ? (
        <FormAlert tone="danger" title="Role not changed" testID="role-problem">
          {problem}
        </FormAlert>
      ) : null}
      <View style={styles.buttons}>
        <RowButton
          label={change.isPending ? 'Saving…' : 'Save role'}
          tone="primary"
          onPress={save}
          disabled={change.isPending || role === member.role}
          testID="save-role"
        />
        <RowButton label="Cancel" onPress={onDone} disabled={change.isPending} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  editor: { gap: spacing.md },
  buttons: { flexDirection: 'row', gap: spacing.sm },
});
