import { Pressable, StyleSheet } from 'react-native';
import { Link } from 'expo-router';
import { colors, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

/** "Password and sessions": opens the account page (`/account`); on the rail it is drawn on the chrome. */
export function AccountLink({ onChrome = false, onDone }: { onChrome?: boolean; onDone?: () => void }) {
  return (
    <Link href="/account" onPress={onDone} asChild>
      <Pressable testID="open-account" style={styles.link}>
        <AppText variant="label" style={onChrome ? styles.chromeLabel : styles.plainLabel}>
          Password and sessions
        </AppText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { paddingVertical: spacing.xs },
  chromeLabel: { color: colors.chromeTextActive, textDecorationLine: 'underline' },
  plainLabel: { color: colors.primary, textDecorationLine: 'underline' },
});
