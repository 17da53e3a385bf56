import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { LegSourceFields } from '@/components/screens/modules/leg-source-fields';
import type { FieldErrors } from '@/components/screens/modules/module-form-model';
import type { StageText } from './cascade-form-model';
import { CoupleRunPicker } from './couple-run-picker';

type Props = { index: number; count: number; value: StageText; onChange: (v: StageText) => void; onRemove: (() => void) | null; errors: FieldErrors; countsOptimised: boolean };

const sources = [
  { value: 'legs', label: 'A p and an n leg' },
  { value: 'couple', label: 'A matched-couple run' },
] as const;

/** One stage of the cascade: its couples, where they come from, and the interface to the next warmer stage. */
export function StageFields({ index, count, value, onChange, onRemove, errors, countsOptimised }: Props) {
  const set = (patch: Partial<StageText>) => onChange({ ...value, ...patch });
  const at = `stages.${index}`;
  const id = `stage-${index + 1}`;
  const where = index === 0 ? ' (coldest, carries the load)' : index === count - 1 ? ' (on the heat sink)' : '';
  return (
    <View style={styles.card} testID={id}>
      <View style={styles.head}>
        <AppText variant="bodyStrong" style={styles.title}>{`Stage ${index + 1}${where}`}</AppText>
        {onRemove ? <Button variant="quiet" label="Remove stage" onPress={onRemove} /> : null}
      </View>
      <TextField
        id={`${id}-couples`}
        label={countsOptimised ? 'Couples (starting count)' : 'Couples'}
        unit="couples"
        mono
        value={value.couples}
        onChangeText={(couples) => set({ couples })}
        error={errors[`${at}.couples`]}
      />
      <ChoiceChips id={`${id}-source`} label="Couples from" choices={sources} value={value.source} onChange={(source) => set({ source })} />
      {value.source === 'couple' ? (
        <CoupleRunPicker runId={value.coupleRunId} onPick={(coupleRunId) => set({ coupleRunId })} error={errors[`${at}.source.runId`] ?? errors[`${at}.source`]} testID={`${id}-couple-run`} />
      ) : (
        <View style={styles.legs}>
          <LegSourceFields side="p" idPrefix={`${id}-`} path={`${at}.source.p`} value={value.p} onChange={(p) => set({ p })} errors={errors} />
          <LegSourceFields side="n" idPrefix={`${id}-`} path={`${at}.source.n`} value={value.n} onChange={(n) => set({ n })} errors={errors} />
        </View>
      )}
      <TextField
        id={`${id}-interface`}
        label={index === count - 1 ? 'Interface resistance to the heat sink' : `Interface resistance to stage ${index + 2}`}
        help="Ceramic plates and grease between this stage's hot side and the next"
        unit="K/W"
        mono
        value={value.interfaceResistance}
        onChangeText={(interfaceResistance) => set({ interfaceResistance })}
        error={errors[`${at}.interfaceResistance`]}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md, padding: spacing.md, borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.background },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm },
  title: { flexShrink: 1 },
  legs: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
});
