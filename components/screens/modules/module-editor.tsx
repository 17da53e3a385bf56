import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { ModuleDesign } from '@/shared/api/modules';
import { useRole } from '@/components/auth/session';
import { ApiError } from '@/components/api/client';
import { moduleCsvUrl, useSaveModule } from '@/components/api/modules';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { DownloadLink } from '@/components/ui/download-link';
import { Section } from '@/components/ui/form-section';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { LegSourceFields } from './leg-source-fields';
import { ModuleReadOnly } from './module-facts';
import { ModuleFields } from './module-fields';
import { moduleInputFrom, type FieldErrors, type ModuleText } from './module-form-model';
import { ModuleResults } from './module-results';

type Props = { initial: ModuleText; saved: ModuleDesign | null; onSaved: (m: ModuleDesign) => void };

const serverErrors = (e: unknown): FieldErrors =>
  e instanceof ApiError ? Object.fromEntries(e.fieldErrors.map((f) => [f.field, f.message])) : {};

/** The couple or module form, Save, CSV export and the curves of the saved module (computed in the browser). */
export function ModuleEditor({ initial, saved, onSaved }: Props) {
  const { can } = useRole();
  const writer = can('designs.write');
  const [text, setText] = useState(initial);
  const [tried, setTried] = useState(false);
  const save = useSaveModule();
  const { input, errors } = moduleInputFrom(text);
  const shown = tried ? { ...serverErrors(save.error), ...errors } : {};
  const downloads = saved ? (
    <>
      <DownloadLink label="Export CSV" url={moduleCsvUrl(saved.id)} testID="module-csv" />
      <DownloadLink label="Export ΔT CSV" url={moduleCsvUrl(saved.id, 'deltaT')} testID="module-csv-delta-t" />
    </>
  ) : null;
  if (!writer && saved) {
    // A role that cannot save reads the settings as text: no inputs that go nowhere.
    return (
      <View style={styles.wrap}>
        <ModuleReadOnly module={saved} />
        <View style={styles.actions}>{downloads}</View>
        <ModuleResults moduleCase={saved.case} />
      </View>
    );
  }
  const submit = () => {
    setTried(true);
    if (input) save.mutate({ id: saved?.id ?? null, body: input }, { onSuccess: (r) => onSaved(r.module) });
  };
  return (
    <View style={styles.wrap}>
      <Section title="Couple" hint="Pair a p-type and an n-type leg.">
        <TextField id="module-name" label="Name" value={text.name} onChangeText={(name) => setText({ ...text, name })} error={shown.name} />
        <View style={styles.legs}>
          <LegSourceFields side="p" value={text.p} onChange={(p) => setText({ ...text, p })} errors={shown} />
          <LegSourceFields side="n" value={text.n} onChange={(n) => setText({ ...text, n })} errors={shown} />
        </View>
      </Section>
      <Section title="Module" hint="N couples electrically in series, thermally in parallel.">
        <ModuleFields value={text} onChange={setText} errors={shown} />
      </Section>
      {save.isError ? (
        <Notice tone="danger" title="Not saved" testID="module-save-error">
          <AppText>{save.error.message}</AppText>
        </Notice>
      ) : null}
      <View style={styles.actions}>
        {writer ? <Button label={save.isPending ? 'Saving…' : saved ? 'Save changes' : 'Save module'} onPress={submit} disabled={save.isPending} /> : null}
        {downloads}
      </View>
      {saved ? (
        <ModuleResults moduleCase={saved.case} />
      ) : (
        <AppText tone="muted">Save the module to see its curves; they are computed from the saved legs.</AppText>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
  legs: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
});
