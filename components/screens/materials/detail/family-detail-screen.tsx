import { useLocalSearchParams } from 'expo-router';
import { ApiError } from '@/components/api/client';
import { useFamilyDetail } from '@/components/api/families';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { FamilyDetail } from './family-detail';

/** A whole number ≥ 1 from the `?version=` parameter, else the current version. */
export function parseVersionParam(raw: string | string[] | undefined): number | undefined {
  const text = Array.isArray(raw) ? raw[0] : raw;
  if (!text || !/^\d+$/.test(text)) return undefined;
  const value = Number(text);
  return value >= 1 ? value : undefined;
}

const back = { label: 'Materials', href: '/materials' } as const;

/** `/materials/[id]` (`?version=N` for an older version). */
export function FamilyDetailScreen() {
  const params = useLocalSearchParams<{ id: string; version?: string }>();
  const id = params.id ?? '';
  const version = parseVersionParam(params.version);
  const query = useFamilyDetail(id, version);
  if (query.data) return <FamilyDetail detail={query.data} back={back} />;
  const notFound = query.error instanceof ApiError && query.error.isNotFound;
  return (
    <ScreenFrame title={notFound ? 'No such family' : 'Material family'} back={back}>
      {query.isError ? (
        <ErrorState
          title={notFound ? 'This family is not in your team' : 'Could not load the family'}
          message={query.error.message}
          onRetry={notFound ? undefined : () => void query.refetch()}
          retrying={query.isFetching}
        />
      ) : (
        <LoadingState label="Loading the family…" />
      )}
    </ScreenFrame>
  );
}
