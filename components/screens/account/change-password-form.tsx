import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { changePasswordSchema } from '@/shared/api/auth';
import { useChangePassword } from '@/components/api/auth';
import { AccountField, newPasswordHelp } from '@/components/auth/form/account-field';
import { FormAlert, FormProblem } from '@/components/auth/form/form-alert';
import { useAccountForm } from '@/components/auth/form/use-account-form';
import { spacing } from '@/components/theme';
import { RowButton } from '@/components/ui/row-button';

const fields = ['currentPassword', 'newPassword'] as const;

/** The current password proves it is you; on success every other session of the account ends. */
export function ChangePasswordForm() {
  const form = useAccountForm(fields, { currentPassword: '', newPassword: '' });
  const change = useChangePassword();
  const [done, setDone] = useState(false);
  const submit = () => {
    if (change.isPending || !form.check(changePasswordSchema)) return;
    setDone(false);
    change.mutate(form.values, {
      onError: form.fail,
      onSuccess: () => {
        setDone(true);
        form.set('currentPassword')('');
        form.set('newPassword')('');
      },
    });
  };
  return (
    <View style={styles.form} testID="change-password">
      {done ? (
        <FormAlert tone="ok" title="Password changed" testID="password-changed">
          Every other session of your account was signed out; this one stays. A note of the change went to your e-mail
          address.
        </FormAlert>
      ) : null}
      <FormProblem title="Password not changed" problem={form.errors.banner} testID="password-problem" />
      <AccountField {...form.field('currentPassword')} label="Current password" kind="current-password" />
      <AccountField {...form.field('newPassword')} label="New password" kind="new-password" help={newPasswordHelp} onSubmit={submit} />
      <View style={styles.row}>
        <RowButton label={change.isPending ? 'Changing…' : 'Change password'} tone="primary" onPress={submit} disabled={change.isPending} testID="submit-password" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  row: { flexDirection: 'row' },
});
