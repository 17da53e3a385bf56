import { StyleSheet, View } from 'react-native';
import type { GrowthOrderDetail } from '@/shared/api/growth';
import { formatDateTime } from '@/components/format/date';
import { colors, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

type GrowthEvent = GrowthOrderDetail['timeline'][number];

const stateWord = (s: string | null) => (s ? s.charAt(0).toUpperCase() + s.slice(1) : '');

/** What happened, in words: "Released as requested", "Growing → Grown". */
export function eventTitle(e: GrowthEvent): string {
  if (e.kind === 'released') return 'Released to the growers';
  if (e.kind === 'state') return `${stateWord(e.fromState)} → ${stateWord(e.toState)}`;
  if (e.kind === 'closed') return `Closed: ${stateWord(e.toState)}`;
  if (e.kind === 'sheet') return 'Sheet settings changed';
  if (e.kind === 'measured') return 'Measurements uploaded';
  return stateWord(e.kind);
}

/** Every change to the order, oldest first: who, when (UTC), what and their note. */
export function OrderTimeline({ events }: { events: GrowthEvent[] }) {
  return (
    <View role="list" aria-label="Timeline" testID="order-timeline" style={styles.list}>
      {events.map((e, i) => (
        <View key={`${e.at}-${i}`} role="listitem" style={styles.item}>
          <View style={styles.rail}>
            <View style={[styles.dot, i === events.length - 1 && styles.dotLast]} />
            {i < events.length - 1 ? <View style={styles.line} /> : null}
          </View>
          <View style={styles.body}>
            <AppText variant="bodyStrong">{eventTitle(e)}</AppText>
            <AppText variant="caption" tone="muted">{`${e.by} · ${formatDateTime(e.at)}`}</AppText>
            {e.note ? <AppText style={styles.note}>{e.note}</AppText> : null}
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  item: { flexDirection: 'row', gap: spacing.md },
  rail: { width: 12, alignItems: 'center' },
  dot: { width: 10, height: 10, borderRadius: 5, marginTop: 6, borderWidth: 2, borderColor: colors.primary, backgroundColor: colors.surface },
  dotLast: { backgroundColor: colors.primary },
  line: { flex: 1, width: 2, backgroundColor: colors.border },
  body: { flex: 1, gap: spacing.xxs, paddingBottom: spacing.md },
  note: { color: colors.textMuted },
});
