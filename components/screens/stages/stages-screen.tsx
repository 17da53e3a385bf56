import { StyleSheet, View } from 'react-native';
import { useRole } from '@/components/auth/session';
import { ReadOnlyNotice } from '@/components/auth/read-only-notice';
import { useCoolers } from '@/components/api/coolers';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { LinkButton } from '@/components/ui/link-button';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { CoolerRow } from './cooler-row';

/** `/stages`: the team's cascades and matched couples, newest first, each with its latest run. */
export function StagesScreen() {
  const { can } = useRole();
  const writer = can('designs.write');
  const query = useCoolers();
  const coolers = query.data?.coolers;
  const cascades = (coolers ?? []).filter((c) => c.kind === 'cascade').length;
  return (
    <ScreenFrame
      title="Stages"
      subtitle="Cascades of stages and matched couples, optimised on the run queue"
      back={{ label: 'Runs', href: '/runs' }}
      refreshing={query.isRefetching}
      onRefresh={() => void query.refetch()}
    >
      <View style={styles.actions}>
        {writer ? <LinkButton label="New cascade" href="/stages/new-cascade" testID="new-cascade" /> : null}
        {writer ? <LinkButton variant="quiet" label="New matched couple" href="/stages/new-couple" testID="new-couple" /> : null}
        {cascades > 0 ? <LinkButton variant="quiet" label="Compare cascades" href="/stages/compare" testID="compare-cascades-link" /> : null}
      </View>
      {writer ? null : <ReadOnlyNotice what="Building and launching cascades and couples" />}
      {query.isPending ? <LoadingState label="Loading cascades and couples…" /> : null}
      {query.isError ? <ErrorState title="Could not load cascades and couples" message={query.error.message} onRetry={() => void query.refetch()} retrying={query.isFetching} /> : null}
      {coolers && coolers.length === 0 ? (
        <EmptyState title="No cascades or couples yet" body="A cascade stacks stages of couples, the coldest on top; a matched couple optimises a p and an n leg on one current. Start from New cascade or New matched couple." />
      ) : null}
      {coolers && coolers.length > 0 ? (
        <>
          <AppText variant="caption" tone="muted">Numbers are model predictions of each setup&apos;s latest run.</AppText>
          <View role="list" aria-label="Cascades and matched couples" style={styles.list}>
            {coolers.map((c) => (
              <View key={c.id} role="listitem">
                <CoolerRow cooler={c} />
              </View>
            ))}
          </View>
        </>
      ) : null}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  list: { gap: spacing.xxs },
});
