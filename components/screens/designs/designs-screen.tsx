import { StyleSheet, View } from 'react-native';
import { useDesigns } from '@/components/api/designs';
import { useRole } from '@/components/auth/session';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { LinkButton } from '@/components/ui/link-button';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/state-views';
import { DesignCard } from './design-card';

/** The team's leg designs, newest change first, and (for physicists) a way to add one. */
export function DesignsScreen() {
  const { can } = useRole();
  const query = useDesigns();
  const refresh = () => void query.refetch();
  const count = query.data?.designs.length;
  return (
    <ScreenFrame
      title="Designs"
      subtitle={count === undefined ? 'Leg designs of your team' : `${count} ${count === 1 ? 'design' : 'designs'} · tap one to estimate, launch or sweep`}
      refreshing={query.isRefetching}
      onRefresh={refresh}
    >
      <View style={styles.toolbar}>
        {can('designs.write') ? <LinkButton label="New design" href="/designs/new" testID="new-design" /> : null}
        <LinkButton label="All runs" href="/runs" variant="quiet" />
      </View>
      {query.isPending ? <LoadingState label="Loading designs…" /> : null}
      {query.isError ? (
        <ErrorState title="Could not load designs" message={query.error.message} onRetry={refresh} retrying={query.isFetching} />
      ) : null}
      {query.data && query.data.designs.length === 0 ? (
        <EmptyState
          title="No designs yet"
          body="A design is one leg: its material family, length and area, the hot-side temperature, what to maximise and what the grower can make. Runs optimise its doping profile."
        />
      ) : null}
      {query.data && query.data.designs.length > 0 ? (
        <View style={styles.list} role="list" aria-label="Designs">
          {query.data.designs.map((d) => (
            <View key={d.id} role="listitem">
              <DesignCard design={d} />
            </View>
          ))}
        </View>
      ) : null}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  toolbar: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  list: { gap: spacing.md },
});
