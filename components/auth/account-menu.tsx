import { useState } from 'react';
import { Modal, Pressable, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { AccountLink } from './account-link';
import { Initials } from './initials';
import { roleSummaries } from './permissions';
import { RoleBadge } from './role-badge';
import { useSession } from './session';
import { SignOutButton } from './sign-out-button';

/**
 * Phone app bar: the member's initials; pressed, a small card with name,
 * role and team, a link to password and sessions, and sign-out.
 */
export function AccountMenu() {
  const session = useSession();
  const insets = useSafeAreaInsets();
  const [open, setOpen] = useState(false);
  if (!session) return null;
  const { user, team } = session;
  const close = () => setOpen(false);
  return (
    <>
      <Pressable
        accessibilityRole="button"
        accessibilityLabel={`Account of ${user.displayName}`}
        aria-expanded={open}
        testID="account-menu-button"
        onPress={() => setOpen(true)}
        style={styles.trigger}
      >
        <Initials name={user.displayName} size={30} />
      </Pressable>
      <Modal visible={open} transparent animationType="fade" onRequestClose={close}>
        <Pressable style={styles.backdrop} onPress={close} accessibilityLabel="Close the account menu" />
        <View style={[styles.card, { top: insets.top + spacing.xxxl + spacing.sm }]} testID="account-menu" role="dialog" aria-label="Account">
          <View style={styles.who}>
            <Initials name={user.displayName} size={40} />
            <View style={styles.names}>
              <AppText variant="bodyStrong">{user.displayName}</AppText>
              <AppText variant="caption" tone="muted">
                {user.email}
              </AppText>
            </View>
          </View>
          <View style={styles.role}>
            <RoleBadge role={user.role} />
            <AppText variant="caption" tone="muted">
              {roleSummaries[user.role]}
            </AppText>
          </View>
          <AppText variant="label">{team.name}</AppText>
          <AccountLink onDone={close} />
          <SignOutButton onDone={close} />
        </View>
      </Modal>
    </>
  );
}

const styles = StyleSheet.create({
  trigger: { padding: spacing.xxs, borderRadius: radii.pill },
  backdrop: { position: 'absolute', top: 0, right: 0, bottom: 0, left: 0, backgroundColor: colors.chrome, opacity: 0.35 },
  card: {
    position: 'absolute',
    right: spacing.md,
    left: spacing.md,
    maxWidth: 360,
    marginLeft: 'auto',
    gap: spacing.md,
    padding: spacing.lg,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.surface,
  },
  who: { flexDirection: 'row', alignItems: 'center', gap: spacing.md },
  names: { flex: 1 },
  role: { gap: spacing.xs },
});
