import { StyleSheet, View } from 'react-native';
import type { ConnectionState } from '@/components/realtime/use-realtime';
import { colors, spacing } from '@/components/theme';
import { Glyph, type GlyphName } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';

const looks: Record<Exclude<ConnectionState, 'off'>, { glyph: GlyphName; color: string; text: string }> = {
  live: { glyph: 'check', color: colors.ok, text: 'Live: updates arrive as the worker reports' },
  connecting: { glyph: 'ring', color: colors.textFaint, text: 'Connecting for live updates…' },
  offline: { glyph: 'bang', color: colors.heat, text: 'Not connected: showing the last stored progress while reconnecting' },
};

/** Whether the numbers on screen are live, in words. */
export function ConnectionLine({ state }: { state: ConnectionState }) {
  if (state === 'off') return null;
  const look = looks[state];
  return (
    <View style={styles.line} testID={`connection-${state}`}>
      <Glyph name={look.glyph} color={look.color} />
      <AppText variant="caption" tone="muted">
        {look.text}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  line: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});
