import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { inviteRequestSchema, type Role } from '@/shared/api/auth';
import { useInvite } from '@/components/api/team';
import { AccountField } from '@/components/auth/form/account-field';
import { FormAlert, FormProblem } from '@/components/auth/form/form-alert';
import { useAccountForm } from '@/components/auth/form/use-account-form';
import { spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { RolePicker } from './role-picker';
import { RowButton } from '@/components/ui/row-button';

const fields = ['email', 'role'] as const;

/** Admins: e-mail a single-use invitation link (valid 7 days) for a role. */
export function InviteForm() {
  const form = useAccountForm(fields, { email: '', role: '' });
  const [role, setRole] = useState<Role>('viewer');
  const [sentTo, setSentTo] = useState<string | null>(null);
  const invite = useInvite();
  const submit = () => {
    if (invite.isPending || !form.check(inviteRequestSchema, { role })) return;
    const email = form.values.email.trim();
    invite.mutate(
      { email, role },
      {
        onError: form.fail,
        onSuccess: () => {
          setSentTo(email);
          form.set('email')('');
        },
      },
    );
  };
  return (
    <View style={styles.form} testID="invite-form">
      {sentTo ? (
        <FormAlert tone="ok" title="Invitation sent" testID="invite-sent">
          {`An e-mail to ${sentTo} is on its way with a link to join. It works once, for 7 days; it is listed under Invitations.`}
        </FormAlert>
      ) : null}
      <FormProblem title="No invitation sent" problem={form.errors.banner} />
      <AccountField
        id="invite-email"
        label="E-mail"
        kind="email"
        value={form.values.email}
        onChangeText={(text) => {
          setSentTo(null);
          form.set('email')(text);
        }}
        error={form.errors.fields.email}
        onSubmit={submit}
      />
      <View style={styles.roles}>
        <AppText variant="label">Role</AppText>
        <RolePicker label="Role of the new member" value={role} onChange={setRole} disabled={invite.isPending} />
        {form.errors.fields.role ? <AppText tone="danger">{form.errors.fields.role}</AppText> : null}
      </View>
      <View style={styles.submit}>
        <RowButton label={invite.isPending ? 'Sending…' : 'Send invitation'} tone="primary" onPress={submit} disabled={invite.isPending} testID="send-invitation" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg, alignItems: 'stretch' },
  roles: { gap: spacing.xs },
  submit: { flexDirection: 'row' },
});
