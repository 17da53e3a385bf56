import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { sheetSettingsSchema, type GrowthOrderDto } from '@/shared/api/growth';
import { ApiError } from '@/components/api/client';
import { useUpdateSheetSettings } from '@/components/api/growth';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Chip } from '@/components/ui/chip';
import { Section } from '@/components/ui/form-section';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { ErrorNotice } from './error-notice';
import { wordIssue } from '@/shared/api/field-labels';

export type SheetSettingsProps = { order: GrowthOrderDto; maxZones: number };

type Draft = { zones: number; lossBudget: string; measureTemperature: string };
type Problems = Partial<Record<'zones' | 'lossBudget' | 'measureTemperature', string>>;

/** Checks the draft with the API's own schema: field → message. */
export function checkSettings(d: Draft): { ok: true; value: { zones: number; lossBudget: number; measureTemperature: number } } | { ok: false; problems: Problems } {
  const parsed = sheetSettingsSchema.safeParse({ zones: d.zones, lossBudget: Number(d.lossBudget.trim() || Number.NaN), measureTemperature: Number(d.measureTemperature.trim() || Number.NaN) });
  if (parsed.success) return { ok: true, value: { zones: d.zones, lossBudget: Number(d.lossBudget), measureTemperature: Number(d.measureTemperature) } };
  const problems: Problems = {};
  for (const issue of parsed.error.issues) {
    const field = String(issue.path[0]) as keyof Problems;
    problems[field] ??= wordIssue(issue);
  }
  return { ok: false, problems };
}

/**
 * The physicist picks K for the grower (instant: every K is on the sheet)
 * and sets the loss budget and the check temperature, which recompute the
 * bands and room-temperature values in a worker.
 */
export function SheetSettings({ order, maxZones }: SheetSettingsProps) {
  const update = useUpdateSheetSettings(order.id);
  const [draft, setDraft] = useState<Draft>({ zones: order.zones, lossBudget: String(order.lossBudget), measureTemperature: String(order.measureTemperature) });
  const [problems, setProblems] = useState<Problems>({});
  const serverField = (f: string) => (update.error instanceof ApiError ? update.error.fieldErrors.find((e) => e.field === f)?.message : undefined);
  const apply = () => {
    const checked = checkSettings(draft);
    if (!checked.ok) {
      setProblems(checked.problems);
      return;
    }
    setProblems({});
    update.mutate(checked.value);
  };
  const counts = Array.from({ length: Math.max(1, Math.min(12, maxZones)) }, (_, i) => i + 1);
  return (
    <Section title="Sheet settings" hint="Choosing K is immediate; a new loss budget or check temperature recomputes the bands and the yield (a few seconds)." testID="sheet-settings">
      <View style={styles.field}>
        <AppText variant="label">Number of zones K</AppText>
        <View style={styles.chips} role="radiogroup" aria-label="Number of zones">
          {counts.map((k) => (
            <Chip key={k} role="radio" label={String(k)} selected={draft.zones === k} onPress={() => setDraft({ ...draft, zones: k })} testID={`zones-${k}`} />
          ))}
        </View>
        {problems.zones ?? serverField('zones') ? <AppText tone="danger">{problems.zones ?? serverField('zones')}</AppText> : null}
      </View>
      <View style={styles.pair}>
        <View style={styles.grow}>
          <TextField id="loss-budget" label="ΔT loss budget (any combination inside the bands)" unit="K" mono keyboardType="decimal-pad" value={draft.lossBudget} onChangeText={(t) => setDraft({ ...draft, lossBudget: t })} error={problems.lossBudget ?? serverField('lossBudget')} />
        </View>
        <View style={styles.grow}>
          <TextField id="check-temperature" label="Check temperature" unit="K" mono keyboardType="decimal-pad" value={draft.measureTemperature} onChangeText={(t) => setDraft({ ...draft, measureTemperature: t })} error={problems.measureTemperature ?? serverField('measureTemperature')} />
        </View>
      </View>
      <Button label={update.isPending ? 'Saving…' : 'Apply settings'} onPress={apply} disabled={update.isPending} />
      {update.error && !serverField('zones') && !serverField('lossBudget') && !serverField('measureTemperature') ? <ErrorNotice title="Settings not saved" error={update.error} /> : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  grow: { flexGrow: 1, flexBasis: 220 },
});
