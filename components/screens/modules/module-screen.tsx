import { StyleSheet, View } from 'react-native';
import { router, useLocalSearchParams } from 'expo-router';
import { useModuleDetail } from '@/components/api/modules';
import { compareHref } from '@/components/screens/runs/compare-model';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { LinkButton } from '@/components/ui/link-button';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { DeleteModule } from './delete-module';
import { ModuleEditor } from './module-editor';
import { defaultModuleText, textFrom } from './module-form-model';

const back = { label: 'Modules', href: '/modules' } as const;

/** `/modules/new?p=<runId>`: a new couple or module, its p leg from a run when given. */
export function NewModuleScreen() {
  const p = useLocalSearchParams<{ p?: string }>().p ?? '';
  return (
    <ScreenFrame title="New module" subtitle="Couples and modules from run legs or families at uniform doping" back={back}>
      <ModuleEditor initial={defaultModuleText(p)} saved={null} onSaved={(m) => router.replace(`/modules/${m.id}`)} />
    </ScreenFrame>
  );
}

/** `/modules/[id]`: a saved module, its curves and CSV export. */
export function ModuleScreen() {
  const id = useLocalSearchParams<{ id: string }>().id ?? '';
  const query = useModuleDetail(id);
  const m = query.data?.module;
  return (
    <ScreenFrame title={m?.name ?? 'Module'} subtitle="Module: Qc, COP, voltage and current versus current and ΔT" back={back}>
      {m ? (
        <View style={styles.actions}>
          <LinkButton variant="quiet" label="Compare with runs or modules" href={compareHref([], [m.id])} testID="module-compare" />
          <DeleteModule module={m} />
        </View>
      ) : null}
      {m ? (
        <ModuleEditor key={m.updatedAt} initial={textFrom(m.input)} saved={m} onSaved={() => void query.refetch()} />
      ) : query.isError ? (
        <ErrorState title="Could not load the module" message={query.error.message} />
      ) : (
        <LoadingState label="Loading the module…" />
      )}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
});
