import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { AccountLink } from './account-link';
import { Initials } from './initials';
import { RoleBadge } from './role-badge';
import { useSession } from './session';
import { SignOutButton } from './sign-out-button';

/** Foot of the side rail: who is signed in, their role and team, password and sessions, and sign-out. */
export function AccountPanel() {
  const session = useSession();
  if (!session) return null;
  const { user, team } = session;
  return (
    <View style={styles.panel} testID="account-panel" aria-label="Signed in">
      <View style={styles.who}>
        <Initials name={user.displayName} />
        <View style={styles.names}>
          <AppText variant="bodyStrong" style={styles.name} numberOfLines={1}>
            {user.displayName}
          </AppText>
          <AppText variant="caption" style={styles.muted} numberOfLines={1}>
            {user.email}
          </AppText>
        </View>
      </View>
      <View style={styles.team}>
        <RoleBadge role={user.role} />
        <AppText variant="caption" style={styles.muted} numberOfLines={2}>
          {team.name}
        </AppText>
      </View>
      <AccountLink onChrome />
      <SignOutButton onChrome />
    </View>
  );
}

const styles = StyleSheet.create({
  panel: {
    gap: spacing.md,
    padding: spacing.md,
    borderRadius: radii.md,
    backgroundColor: colors.chromeBorder,
  },
  who: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  names: { flex: 1 },
  name: { color: colors.chromeTextActive },
  muted: { color: colors.chromeText },
  team: { gap: spacing.xs },
});
