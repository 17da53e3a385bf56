import { Pressable, type PressableStateCallbackType, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import type { GrowthOrderDto } from '@/shared/api/growth';
import { formatDay } from '@/components/format/date';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { StateBadge } from '@/components/ui/state-badge';
import { AppText } from '@/components/ui/text';
import { growthStateLook, isClosed, sheetStatusLook } from './growth-state';

/** react-native-web also reports hover, which React Native's types omit. */
type WebPressState = PressableStateCallbackType & { hovered?: boolean };

/** "due 12 Mar 2027", "no due date". */
export function dueText(order: Pick<GrowthOrderDto, 'dueDate'>): string {
  return order.dueDate ? `due ${formatDay(order.dueDate)}` : 'no due date';
}

/** One growth order: batch, design, state and sheet status in words, due date; opens the order. */
export function OrderCard({ order }: { order: GrowthOrderDto }) {
  return (
    <Link href={`/growth/${order.id}`} asChild>
      <Pressable testID={`order-card-${order.id}`} aria-label={`Growth order ${order.batch}, ${growthStateLook[order.state].label}`} style={styles.pressable}>
        {({ pressed, hovered }: WebPressState) => <CardBody order={order} highlighted={pressed || hovered === true} />}
      </Pressable>
    </Link>
  );
}

function CardBody({ order, highlighted }: { order: GrowthOrderDto; highlighted: boolean }) {
  return (
    <View style={[styles.card, highlighted && styles.hovered]}>
      <View style={styles.titleRow}>
        <View style={styles.titles}>
          <AppText variant="monoStrong" tone="muted">
            BATCH
          </AppText>
          <AppText variant="heading">{order.batch}</AppText>
        </View>
        <Glyph name="chevron-right" color={colors.textFaint} />
      </View>
      <AppText tone="muted" numberOfLines={1}>
        {`Run ${order.runNumber} · ${order.designName}`}
      </AppText>
      <View style={styles.pills}>
        <StateBadge look={growthStateLook[order.state]} testID="order-state" />
        {isClosed(order.state) ? null : <StateBadge look={sheetStatusLook[order.sheetStatus]} testID="order-sheet-status" />}
      </View>
      <AppText variant="caption" tone="muted">
        {`${dueText(order)} · ${order.zones} ${order.zones === 1 ? 'zone' : 'zones'} · released ${formatDay(order.createdAt)} by ${order.releasedBy}`}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  pressable: { flexGrow: 1, flexBasis: 300 },
  card: {
    flex: 1,
    gap: spacing.sm,
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    padding: spacing.lg,
  },
  hovered: { borderColor: colors.primary },
  titleRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  titles: { flex: 1, gap: spacing.xxs },
  pills: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
