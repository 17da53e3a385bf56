import { StyleSheet, View } from 'react-native';
import { Initials } from '@/components/auth/initials';
import { roleSummaries } from '@/components/auth/permissions';
import { RoleBadge } from '@/components/auth/role-badge';
import { useSession } from '@/components/auth/session';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { Section } from '@/components/ui/form-section';
import { AppText } from '@/components/ui/text';
import { ChangePasswordForm } from './change-password-form';
import { SignOutEverywhere } from './sign-out-everywhere';

/** `/account`: who you are in the team, your password, and your sessions. */
export function AccountScreen() {
  const session = useSession();
  if (!session) return null;
  const { user, team } = session;
  return (
    <ScreenFrame title="Your account" subtitle={team.name} back={{ label: 'Team', href: '/team' }}>
      <View style={styles.who} testID="account-who">
        <Initials name={user.displayName} size={48} />
        <View style={styles.names}>
          <AppText variant="heading">{user.displayName}</AppText>
          <AppText tone="muted">{user.email}</AppText>
          <View style={styles.role}>
            <RoleBadge role={user.role} />
            <AppText variant="caption" tone="muted" style={styles.roleText}>
              {roleSummaries[user.role]}
            </AppText>
          </View>
        </View>
      </View>
      <Section title="Password" hint="Changing it signs your account out everywhere else; we e-mail you a note of the change.">
        <ChangePasswordForm />
      </Section>
      <Section title="Sessions" hint="Left yourself signed in on a shared or lost device? End every session of your account at once.">
        <SignOutEverywhere />
      </Section>
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  who: { flexDirection: 'row', alignItems: 'center', gap: spacing.md },
  names: { flex: 1, gap: spacing.xxs },
  role: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.sm },
  roleText: { flex: 1 },
});
