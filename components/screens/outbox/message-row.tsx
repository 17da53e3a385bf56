import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import type { OutboxMessage } from '@/shared/api/outbox';
import { formatDateTime } from '@/components/format/date';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';

/** A captured e-mail; pressing the header shows or hides its text. */
export function MessageRow({ message }: { message: OutboxMessage }) {
  const [open, setOpen] = useState(false);
  return (
    <View style={styles.card} role="listitem">
      <Pressable
        accessibilityRole="button"
        accessibilityState={{ expanded: open }}
        accessibilityHint={open ? 'Hides the message text' : 'Shows the message text'}
        onPress={() => setOpen((value) => !value)}
        style={({ pressed }) => [styles.header, pressed && styles.pressed]}
      >
        <View style={styles.glyph}>
          <Glyph name={open ? 'chevron-down' : 'chevron-right'} color={colors.primary} />
        </View>
        <View style={styles.headings}>
          <AppText variant="bodyStrong">{message.subject || '(no subject)'}</AppText>
          <AppText variant="caption" tone="muted">
            {`${message.from} → ${message.to.join(', ')}`}
          </AppText>
        </View>
        <AppText variant="mono" tone="faint" style={styles.when}>
          {formatDateTime(message.receivedAt)}
        </AppText>
      </Pressable>
      {open ? (
        <View style={styles.body}>
          <AppText variant="mono" selectable>
            {message.text}
          </AppText>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    overflow: 'hidden',
  },
  header: {
    flexDirection: 'row',
    alignItems: 'flex-start',
    flexWrap: 'wrap',
    gap: spacing.md,
    padding: spacing.lg,
  },
  pressed: { backgroundColor: colors.surfaceSunken },
  // Centres the 16-px glyph on the first 22-px line of the subject.
  glyph: { marginTop: 3 },
  headings: { flex: 1, minWidth: 200, gap: spacing.xxs },
  when: { marginLeft: spacing.xl + spacing.xs },
  body: {
    borderTopWidth: 1,
    borderTopColor: colors.border,
    backgroundColor: colors.background,
    padding: spacing.lg,
  },
});
