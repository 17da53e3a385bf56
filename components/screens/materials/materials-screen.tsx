import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { FamiliesResponse } from '@/shared/api/families';
import { useFamilies, type FamilyFilter } from '@/components/api/families';
import { useRole } from '@/components/auth/session';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { LinkButton } from '@/components/ui/link-button';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/state-views';
import { FamilyGrid } from './family-grid';

function describe(data: FamiliesResponse | undefined, filter: FamilyFilter): string {
  if (!data) return 'Material families of your team';
  const count = data.families.length;
  const what = `${count} ${filter === 'archived' ? 'archived ' : ''}${count === 1 ? 'family' : 'families'}`;
  return `${data.team.name} · ${what}`;
}

const emptyText: Record<FamilyFilter, { title: string; body: string }> = {
  active: {
    title: 'No material families yet',
    body: 'A family describes how the Seebeck coefficient and the electrical and thermal conductivity depend on doping and temperature. Start with a band model or upload a measured table.',
  },
  archived: {
    title: 'Nothing archived',
    body: 'Archived families stay readable, and runs that used them keep working; they are just out of the way.',
  },
};

/** Home: the team's material families (active or archived), and ways to add one. */
export function MaterialsScreen() {
  const [filter, setFilter] = useState<FamilyFilter>('active');
  const { can } = useRole();
  const query = useFamilies(filter);
  const refresh = () => void query.refetch();
  return (
    <ScreenFrame
      title="Materials"
      subtitle={describe(query.data, filter)}
      refreshing={query.isRefetching}
      onRefresh={refresh}
    >
      <View style={styles.toolbar}>
        {can('families.write') ? (
          <View style={styles.actions}>
            <LinkButton label="New band-model family" href="/materials/new" testID="new-family" />
            <LinkButton label="Upload measured table" href="/materials/upload" variant="quiet" testID="upload-family" />
          </View>
        ) : null}
        <View style={styles.filters} role="tablist" aria-label="Which families">
          <Chip role="tab" label="Active" selected={filter === 'active'} onPress={() => setFilter('active')} />
          <Chip role="tab" label="Archived" selected={filter === 'archived'} onPress={() => setFilter('archived')} />
        </View>
      </View>
      {query.isPending ? <LoadingState label="Loading material families…" /> : null}
      {query.isError ? (
        <ErrorState
          title="Could not load material families"
          message={query.error.message}
          onRetry={refresh}
          retrying={query.isFetching}
        />
      ) : null}
      {query.data && query.data.families.length === 0 ? <EmptyState {...emptyText[filter]} /> : null}
      {query.data && query.data.families.length > 0 ? <FamilyGrid families={query.data.families} /> : null}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  toolbar: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    justifyContent: 'space-between',
    alignItems: 'center',
    gap: spacing.md,
  },
  // Never wider than the toolbar: on a narrow phone the two buttons wrap rather than push past the edge.
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, maxWidth: '100%' },
  filters: { flexDirection: 'row', gap: spacing.sm },
});
