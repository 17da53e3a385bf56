import { StyleSheet, View } from 'react-native';
import type { Cooler, CoolerInput } from '@/shared/api/coolers';
import { useRole } from '@/components/auth/session';
import { useLaunchCooler, useSaveCooler } from '@/components/api/coolers';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import type { FieldErrors } from '@/components/screens/modules/module-form-model';
import { serverFieldErrors } from './cooler-errors';

export type SavedTo = { cooler: Cooler; launchedRunId: string | null };

/**
 * Saving a cooler, and saving then launching it: the API checks the setup
 * with the engine on save (a 400 names the field), then queues a run.
 */
export function useCoolerSave(savedId: string | null, onSaved: (to: SavedTo) => void) {
  const save = useSaveCooler();
  const launch = useLaunchCooler();
  const submit = (input: CoolerInput | null, andLaunch: boolean) => {
    if (!input) return;
    save.mutate(
      { id: savedId, body: input },
      {
        onSuccess: (r) => {
          if (!andLaunch) return onSaved({ cooler: r.cooler, launchedRunId: null });
          launch.mutate(r.cooler.id, { onSettled: (l) => onSaved({ cooler: r.cooler, launchedRunId: l?.run.id ?? null }) });
        },
      },
    );
  };
  return { submit, busy: save.isPending || launch.isPending, serverErrors: serverFieldErrors(save.error), error: save.error ?? launch.error };
}

type BarProps = { shown: FieldErrors; tried: boolean; busy: boolean; error: Error | null; isNew: boolean; onSave: (andLaunch: boolean) => void };

/** Save (and Save and launch, for a role that may launch), with what stopped the save in words. */
export function CoolerSaveBar({ shown, tried, busy, error, isNew, onSave }: BarProps) {
  const { can } = useRole();
  const problems = Object.values(shown);
  return (
    <View style={styles.wrap}>
      {tried && problems.length > 0 ? (
        <Notice tone="danger" title="Not saved: check these fields" testID="cooler-form-problems">
          {problems.map((m, i) => (
            <AppText key={i}>{m}</AppText>
          ))}
        </Notice>
      ) : null}
      {error && problems.length === 0 ? (
        <Notice tone="danger" title="Not saved" testID="cooler-save-error">
          <AppText>{error.message}</AppText>
        </Notice>
      ) : null}
      <View style={styles.buttons}>
        <Button label={busy ? 'Saving…' : isNew ? 'Save' : 'Save changes'} onPress={() => onSave(false)} disabled={busy} />
        {can('runs.launch') ? <Button variant="quiet" label="Save and launch" onPress={() => onSave(true)} disabled={busy} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
