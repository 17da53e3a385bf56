import { StyleSheet, View } from 'react-native';
import type { GrowthOrderDto } from '@/shared/api/growth';
import { Can } from '@/components/auth/session';
import { spacing } from '@/components/theme';
import { LinkButton } from '@/components/ui/link-button';
import { Notice } from '@/components/ui/notice';
import { StateBadge } from '@/components/ui/state-badge';
import { AppText } from '@/components/ui/text';
import { growthStateLook, isClosed, sheetStatusLook } from './growth-state';
import { StateStepper } from './state-stepper';

/** Where the order stands: state and sheet status in words, the steps, the physicist's notes and verdict. */
export function OrderOverview({ order }: { order: GrowthOrderDto }) {
  const closed = isClosed(order.state);
  return (
    <View style={styles.wrap}>
      <View style={styles.status}>
        <View style={styles.pills}>
          <StateBadge look={growthStateLook[order.state]} size="large" testID="order-state" />
          {closed ? null : <StateBadge look={sheetStatusLook[order.sheetStatus]} testID="order-sheet-status" />}
        </View>
        {/* Growers see released profiles here, not runs (shared/api/permissions.ts). */}
        <Can action="designs.read">
          <LinkButton variant="quiet" label={`Run ${order.runNumber}`} href={`/runs/${order.runId}`} testID="order-run-link" />
        </Can>
      </View>
      <StateStepper state={order.state} />
      {order.notes ? (
        <Notice tone="info" title={`Notes from ${order.releasedBy}`} testID="order-notes">
          <AppText>{order.notes}</AppText>
        </Notice>
      ) : null}
      {closed && order.closeReason ? (
        <Notice tone={order.state === 'approved' ? 'ok' : 'danger'} title={`${growthStateLook[order.state].label}: reason`} testID="close-reason">
          <AppText>{order.closeReason}</AppText>
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  status: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.md },
  pills: { flexShrink: 1, flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
});
