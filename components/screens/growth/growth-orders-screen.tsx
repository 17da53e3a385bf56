import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useGrowthOrders } from '@/components/api/growth';
import { useRole } from '@/components/auth/session';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/state-views';
import { isClosed, sortOrders } from './growth-state';
import { OrderCard } from './order-card';
import { useGrowthEvents } from './use-growth-events';

type Filter = 'open' | 'closed';

/** What an empty list means depends on who is looking. */
function emptyText(filter: Filter, mayRelease: boolean): { title: string; body: string } {
  if (filter === 'closed') return { title: 'Nothing closed yet', body: 'Orders the physicist has approved or rejected are kept here with their timeline.' };
  return {
    title: 'No open growth orders',
    body: mayRelease
      ? 'Release a converged run from its page ("Release to grower") to send its doping profile to the growers as a growth sheet.'
      : 'When a physicist releases a doping profile, its growth order appears here and growers are e-mailed.',
  };
}

/** `/growth`: the team's growth orders, open ones first by due date. */
export function GrowthOrdersScreen() {
  const [filter, setFilter] = useState<Filter>('open');
  const { can } = useRole();
  const query = useGrowthOrders();
  useGrowthEvents();
  const refresh = () => void query.refetch();
  const orders = sortOrders(query.data?.orders ?? []).filter((o) => isClosed(o.state) === (filter === 'closed'));
  const openCount = (query.data?.orders ?? []).filter((o) => !isClosed(o.state)).length;
  return (
    <ScreenFrame
      title="Growth"
      subtitle={query.data ? `${openCount} open ${openCount === 1 ? 'order' : 'orders'} · released profiles, their sheets and as-grown checks` : 'Released profiles, their growth sheets and as-grown checks'}
      refreshing={query.isRefetching}
      onRefresh={refresh}
    >
      <View style={styles.filters} role="tablist" aria-label="Which orders">
        <Chip role="tab" label="Open" selected={filter === 'open'} onPress={() => setFilter('open')} />
        <Chip role="tab" label="Closed" selected={filter === 'closed'} onPress={() => setFilter('closed')} />
      </View>
      {query.isPending ? <LoadingState label="Loading growth orders…" /> : null}
      {query.isError ? <ErrorState title="Could not load growth orders" message={query.error.message} onRetry={refresh} retrying={query.isFetching} /> : null}
      {query.data && orders.length === 0 ? <EmptyState {...emptyText(filter, can('profiles.release'))} /> : null}
      {orders.length > 0 ? (
        <View style={styles.grid} testID="growth-orders">
          {orders.map((o) => (
            <OrderCard key={o.id} order={o} />
          ))}
        </View>
      ) : null}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  filters: { flexDirection: 'row', gap: spacing.sm },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
