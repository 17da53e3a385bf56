import { StyleSheet } from 'react-native';
import { Link, type Href } from 'expo-router';
import { colors, type as typeScale } from '@/components/theme';
import { AppText } from '@/components/ui/text';

/** "New to Frostgrade? Start a team": a muted lead-in and an underlined link. */
export function AuthLink({ lead, label, href, testID }: { lead?: string; label: string; href: Href; testID?: string }) {
  return (
    <AppText tone="muted">
      {lead ? `${lead} ` : null}
      <Link href={href} style={styles.link} testID={testID}>
        {label}
      </Link>
    </AppText>
  );
}

const styles = StyleSheet.create({
  link: { ...typeScale.bodyStrong, color: colors.primary, textDecorationLine: 'underline' },
});
