import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { yieldSettingsSchema, type GrowthOrderDto } from '@/shared/api/growth';
import { ApiError } from '@/components/api/client';
import { useUpdateScatter } from '@/components/api/growth';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { ErrorNotice } from './error-notice';
import { wordIssue } from '@/shared/api/field-labels';

/** The draft checked with the API's own schema: the scatter, or the message for the field. */
export function checkScatter(text: string): { ok: true; value: number } | { ok: false; message: string } {
  const parsed = yieldSettingsSchema.safeParse({ dopingScatter: Number(text.trim() || Number.NaN) });
  return parsed.success ? { ok: true, value: parsed.data.dopingScatter } : { ok: false, message: parsed.error.issues[0] ? wordIssue(parsed.error.issues[0]) : 'The doping scatter is not valid' };
}

/**
 * The grower's typical doping scatter per zone (decades, 1σ); applying it
 * recomputes the yield in a worker while the zones and bands stay.
 */
export function ScatterSettings({ order }: { order: GrowthOrderDto }) {
  const update = useUpdateScatter(order.id);
  const [draft, setDraft] = useState(String(order.dopingScatter));
  const [problem, setProblem] = useState<string | undefined>();
  const serverField = update.error instanceof ApiError ? update.error.fieldErrors.find((e) => e.field === 'dopingScatter')?.message : undefined;
  const apply = () => {
    const checked = checkScatter(draft);
    if (!checked.ok) {
      setProblem(checked.message);
      return;
    }
    setProblem(undefined);
    update.mutate({ dopingScatter: checked.value });
  };
  const busy = update.isPending || order.yieldStatus === 'computing';
  return (
    <View style={styles.wrap} testID="scatter-settings">
      <View style={styles.row}>
        <View style={styles.field}>
          <TextField id="doping-scatter" label="Doping scatter per zone (1σ)" unit="decades" mono keyboardType="decimal-pad" help="How far your grown zones typically land from their targets: 0.05 decades is ±12 % in doping." value={draft} onChangeText={setDraft} error={problem ?? serverField} />
        </View>
        <Button label={busy ? 'Recomputing…' : 'Recompute yield'} onPress={apply} disabled={busy} />
      </View>
      {update.error && !serverField ? <ErrorNotice title="Scatter not saved" error={update.error} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: spacing.md },
  field: { flexGrow: 1, flexBasis: 220, maxWidth: 360 },
});
