import { StyleSheet, View } from 'react-native';
import { colors, radii } from '@/components/theme';
import { AppText } from '@/components/ui/text';

/** "Ada Lovelace" → "AL"; one word → its first letter. */
export function initialsOf(name: string): string {
  const words = name.trim().split(/\s+/).filter(Boolean);
  const letters = words.length > 1 ? [words[0], words[words.length - 1]] : words;
  return letters.map((word) => word.charAt(0).toUpperCase()).join('') || '?';
}

/** A round tag with the member's initials (decorative: the name is always written beside or in the label). */
export function Initials({ name, size = 32 }: { name: string; size?: number }) {
  return (
    <View style={[styles.circle, { width: size, height: size }]} aria-hidden>
      <AppText variant="label" style={styles.letters}>
        {initialsOf(name)}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  circle: {
    borderRadius: radii.pill,
    alignItems: 'center',
    justifyContent: 'center',
    backgroundColor: colors.primarySoft,
    borderWidth: 1,
    borderColor: colors.coldBright,
  },
  letters: { color: colors.primary },
});
