import { StyleSheet, View } from 'react-native';
import { useRole } from '@/components/auth/session';
import { useModules } from '@/components/api/modules';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { LinkButton } from '@/components/ui/link-button';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/state-views';
import { CompareBar, useCompareSelection } from '@/components/screens/runs/compare-bar';
import { compareHref, maxCompared } from '@/components/screens/runs/compare-model';
import { ModuleRow } from './module-row';

/** `/modules`: the team's saved couples and modules, newest change first; tick some to compare. */
export function ModulesScreen() {
  const { can } = useRole();
  const query = useModules();
  const { selected, toggle, clear } = useCompareSelection();
  const modules = query.data?.modules;
  const n = selected.length;
  return (
    <ScreenFrame
      title="Modules"
      subtitle="Couples and modules built from run legs or families"
      back={{ label: 'Runs', href: '/runs' }}
      accessory={can('designs.write') ? <LinkButton label="New module" href="/modules/new" testID="new-module" /> : undefined}
      refreshing={query.isRefetching}
      onRefresh={() => void query.refetch()}
    >
      <CompareBar
        count={n}
        hint={`Tick up to ${maxCompared} modules to compare them; runs can be added there.`}
        link={n >= 1 ? { label: n === 1 ? 'Compare with runs' : `Compare ${n} modules`, href: compareHref([], selected), testID: 'module-compare-link' } : null}
        onClear={clear}
        testID="module-compare-bar"
      />
      {query.isPending ? <LoadingState label="Loading modules…" /> : null}
      {query.isError ? <ErrorState title="Could not load modules" message={query.error.message} onRetry={() => void query.refetch()} retrying={query.isFetching} /> : null}
      {modules && modules.length === 0 ? (
        <EmptyState title="No modules yet" body="Open a finished run's operating curves and choose “Build a module with this leg”, or start from New module with two families." />
      ) : null}
      {modules && modules.length > 0 ? (
        <View role="list" aria-label="Modules" style={styles.list}>
          {modules.map((m) => (
            <View key={m.id} role="listitem">
              <ModuleRow module={m} selection={{ selected: selected.includes(m.id), onToggle: () => toggle(m.id) }} />
            </View>
          ))}
        </View>
      ) : null}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.xxs },
});
