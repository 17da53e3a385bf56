import { useLocalSearchParams } from 'expo-router';
import type { Design } from '@/shared/api/designs';
import { ApiError } from '@/components/api/client';
import { useDesign } from '@/components/api/designs';
import { useRole } from '@/components/auth/session';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { Section } from '@/components/ui/form-section';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { DesignActions } from './design-actions';
import { DesignFacts } from './design-facts';
import { valuesFromDesign } from './design-form-model';
import { DesignRuns } from './design-runs';
import { QuickEstimate } from './quick-estimate';
import { SweepPanel } from './sweep-panel';

const back = { label: 'Designs', href: '/designs' } as const;

function DesignPage({ design }: { design: Design }) {
  const { can } = useRole();
  return (
    <ScreenFrame title={design.name} subtitle={`${design.familyName} · created by ${design.createdBy}`} back={back}>
      <DesignActions design={design} />
      <Section title="Design" hint="In the trade's units; runs freeze these values.">
        <DesignFacts design={design} />
        {design.notes ? <AppText tone="muted">{design.notes}</AppText> : null}
      </Section>
      <QuickEstimate values={valuesFromDesign(design)} onInvalid={() => undefined} />
      <DesignRuns designId={design.id} />
      {can('runs.launch') ? <SweepPanel design={design} /> : null}
    </ScreenFrame>
  );
}

/** `/designs/[id]`: the design, a quick estimate, its runs and sweeps, and the ways to launch more. */
export function DesignDetailScreen() {
  const id = useLocalSearchParams<{ id: string }>().id ?? '';
  const query = useDesign(id);
  if (query.data) return <DesignPage design={query.data.design} />;
  const notFound = query.error instanceof ApiError && query.error.isNotFound;
  return (
    <ScreenFrame title={notFound ? 'No such design' : 'Design'} back={back}>
      {query.isError ? (
        <ErrorState
          title={notFound ? 'This design is not in your team' : 'Could not load the design'}
          message={query.error.message}
          onRetry={notFound ? undefined : () => void query.refetch()}
          retrying={query.isFetching}
        />
      ) : (
        <LoadingState label="Loading the design…" />
      )}
    </ScreenFrame>
  );
}
