import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { ApiError } from '@/components/api/client';
import { useReleaseRun } from '@/components/api/growth';
import { useRole } from '@/components/auth/session';
import { colors, radii, spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { ErrorNotice } from './error-notice';
import { checkRelease, emptyRelease, type ReleaseDraft, type ReleaseField } from './release-form-model';

type FieldSpec = { field: ReleaseField; label: string; unit?: string; help?: string; required?: boolean; multiline?: boolean; numeric?: boolean };

const fields: FieldSpec[] = [
  { field: 'batch', label: 'Batch', help: 'The name the grower files the piece under, e.g. NL-P7-24-031.', required: true },
  { field: 'dueDate', label: 'Due date', help: 'Optional, as YYYY-MM-DD.' },
  { field: 'zones', label: 'Zones K', help: '1–12 constant-doping zones; the sheet shows every K, you can change it later.', numeric: true },
  { field: 'lossBudget', label: 'ΔT loss budget (any combination inside the bands)', unit: 'K', numeric: true },
  { field: 'measureTemperature', label: 'Check temperature', unit: 'K', help: 'Where the grower measures S and σ (usually room temperature).', numeric: true },
  { field: 'notes', label: 'Notes for the grower', multiline: true },
];

function ReleaseForm({ runId, onClose }: { runId: string; onClose: () => void }) {
  const router = useRouter();
  const release = useReleaseRun();
  const [draft, setDraft] = useState<ReleaseDraft>(emptyRelease);
  const [problems, setProblems] = useState<Partial<Record<ReleaseField, string>>>({});
  const serverField = (f: string) => (release.error instanceof ApiError ? release.error.fieldErrors.find((e) => e.field === f)?.message : undefined);
  const submit = () => {
    const checked = checkRelease(draft);
    if (!checked.ok) {
      setProblems(checked.problems);
      return;
    }
    setProblems({});
    release.mutate({ runId, body: checked.body }, { onSuccess: ({ order }) => router.push(`/growth/${order.id}`) });
  };
  return (
    <View style={styles.panel} testID="release-form">
      <AppText variant="heading" role="heading" aria-level={2}>
        Release to grower
      </AppText>
      <AppText tone="muted">Growers of the team are e-mailed; a worker computes the growth sheet (zones, tolerance bands, room-temperature checks).</AppText>
      <View style={styles.fields}>
        {fields.map((f) => (
          <View key={f.field} style={f.multiline ? styles.full : styles.half}>
            <TextField
              id={`release-${f.field}`}
              label={f.label}
              unit={f.unit}
              help={f.help}
              required={f.required}
              multiline={f.multiline}
              mono={f.numeric}
              keyboardType={f.numeric ? 'decimal-pad' : undefined}
              value={draft[f.field]}
              onChangeText={(text) => setDraft({ ...draft, [f.field]: text })}
              error={problems[f.field] ?? serverField(f.field)}
            />
          </View>
        ))}
      </View>
      <View style={styles.buttons}>
        <Button label={release.isPending ? 'Releasing…' : 'Release to grower'} onPress={submit} disabled={release.isPending} />
        <Button label="Cancel" variant="quiet" onPress={onClose} disabled={release.isPending} />
      </View>
      {release.error ? <ErrorNotice title="Not released" error={release.error} /> : null}
    </View>
  );
}

/**
 * "Release to grower" for a converged run (physicists and admins only):
 * opens a short form, releases, and opens the new growth order.
 */
export function ReleaseButton({ runId }: { runId: string }) {
  const { can } = useRole();
  const [open, setOpen] = useState(false);
  if (!can('profiles.release')) return null;
  return open ? <ReleaseForm runId={runId} onClose={() => setOpen(false)} /> : <Button label="Release to grower" onPress={() => setOpen(true)} />;
}

const styles = StyleSheet.create({
  panel: { gap: spacing.md, padding: spacing.lg, borderRadius: radii.lg, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.primary },
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  half: { flexGrow: 1, flexBasis: 260 },
  full: { flexBasis: '100%' },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
