import type { FamiliesResponse } from '@/shared/api/families';
import { useFamilies } from '@/components/api/families';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/state-views';
import { FamilyGrid } from './family-grid';

function describe(data: FamiliesResponse | undefined): string {
  if (!data) return 'Material families of your team';
  const count = data.families.length;
  return `${data.team.name} · ${count} ${count === 1 ? 'family' : 'families'}`;
}

/** Home: the team's material families, with loading, empty and error states. */
export function MaterialsScreen() {
  const query = useFamilies();
  const refresh = () => void query.refetch();
  return (
    <ScreenFrame
      title="Materials"
      subtitle={describe(query.data)}
      refreshing={query.isRefetching}
      onRefresh={refresh}
    >
      {query.isPending ? <LoadingState label="Loading material families…" /> : null}
      {query.isError ? (
        <ErrorState
          title="Could not load material families"
          message={query.error.message}
          onRetry={refresh}
          retrying={query.isFetching}
        />
      ) : null}
      {query.data && query.data.families.length === 0 ? (
        <EmptyState
          title="No material families yet"
          body="A family describes how the Seebeck coefficient and the electrical and thermal conductivity depend on doping and temperature. This team has none yet."
        />
      ) : null}
      {query.data && query.data.families.length > 0 ? (
        <FamilyGrid families={query.data.families} />
      ) : null}
    </ScreenFrame>
  );
}
