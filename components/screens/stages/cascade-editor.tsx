import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { Section } from '@/components/ui/form-section';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { cascadeInputFrom, maxStages, withStageAdded, withStageRemoved, type CascadeText } from './cascade-form-model';
import { CoolerSaveBar, useCoolerSave, type SavedTo } from './cooler-save';
import { StageFields } from './stage-fields';

type Props = { initial: CascadeText; savedId: string | null; onSaved: (to: SavedTo) => void };

const objectives = [
  { value: 'maxDeltaT', label: 'Largest ΔT at the heat load' },
  { value: 'minPower', label: 'Least power at a cold side' },
] as const;
const wirings = [
  { value: 'series', label: 'Series, one supply' },
  { value: 'separate', label: 'One supply per stage' },
] as const;
const counts = [
  { value: 'fixed', label: 'As typed' },
  { value: 'optimised', label: 'Optimised within a total' },
] as const;

/** The cascade form: conditions, objective, wiring, the couple counts, and the stages coldest first (1 to 4). */
export function CascadeEditor({ initial, savedId, onSaved }: Props) {
  const [text, setText] = useState(initial);
  const [tried, setTried] = useState(false);
  const { submit, busy, serverErrors, error } = useCoolerSave(savedId, onSaved);
  const { input, errors } = cascadeInputFrom(text);
  const shown = tried ? { ...serverErrors, ...errors } : {};
  const set = (patch: Partial<CascadeText>) => setText({ ...text, ...patch });
  const onSave = (andLaunch: boolean) => {
    setTried(true);
    submit(input, andLaunch);
  };
  return (
    <View style={styles.wrap}>
      <Section title="Cascade" hint="The heat sink, the load on the coldest stage and what the optimiser looks for.">
        <TextField id="cascade-name" label="Name" value={text.name} onChangeText={(name) => set({ name })} error={shown.name} />
        <View style={styles.grid}>
          <View style={styles.field}>
            <TextField id="cascade-hotSide" label="Heat sink Th" unit="K" mono value={text.hotSide} onChangeText={(hotSide) => set({ hotSide })} error={shown.hotSide} />
          </View>
          <View style={styles.field}>
            <TextField id="cascade-heatLoad" label="Heat load on the coldest stage" help="The detector's load" unit="mW" mono value={text.heatLoadMw} onChangeText={(heatLoadMw) => set({ heatLoadMw })} error={shown.heatLoad} />
          </View>
        </View>
        <ChoiceChips id="cascade-objective" label="Objective" choices={objectives} value={text.objective} onChange={(objective) => set({ objective })} hint={text.objective === 'minPower' ? 'Hold the cold side at the target with the load on it, for the least input power.' : 'The coldest cold side the cascade reaches with the load on it.'} />
        {text.objective === 'minPower' ? (
          <TextField id="cascade-coldSide" label="Cold-side target Tc" unit="K" mono value={text.coldSide} onChangeText={(coldSide) => set({ coldSide })} error={shown.coldSide} />
        ) : null}
        <ChoiceChips id="cascade-wiring" label="Wiring" choices={wirings} value={text.wiring} onChange={(wiring) => set({ wiring })} hint={text.wiring === 'series' ? 'One current through every stage.' : 'Each stage on its own supply, its current optimised.'} />
        <ChoiceChips id="cascade-counts" label="Couple counts" choices={counts} value={text.countsOptimised ? 'optimised' : 'fixed'} onChange={(v) => set({ countsOptimised: v === 'optimised' })} hint={text.countsOptimised ? 'The optimiser shares the total out among the stages (the pyramid).' : 'Each stage keeps the count typed below.'} />
        {text.countsOptimised ? (
          <TextField id="cascade-total" label="Total couples" unit="couples" mono value={text.totalCouples} onChangeText={(totalCouples) => set({ totalCouples })} error={shown['couplesLimit.total'] ?? shown.couplesLimit} />
        ) : null}
        <TextField id="cascade-starts" label="Search starts" help="More starts search wider and take longer" mono value={text.starts} onChangeText={(starts) => set({ starts })} error={shown.starts} />
      </Section>
      <Section title="Stages, coldest first" hint={`Stage 1 holds the load; each stage's rejected heat is the load of the next warmer stage. Up to ${maxStages} stages.`}>
        {shown.stages ? <AppText tone="danger">{shown.stages}</AppText> : null}
        {text.stages.map((s, i) => (
          <StageFields
            key={i}
            index={i}
            count={text.stages.length}
            value={s}
            onChange={(v) => set({ stages: text.stages.map((x, k) => (k === i ? v : x)) })}
            onRemove={text.stages.length > 1 ? () => setText(withStageRemoved(text, i)) : null}
            errors={shown}
            countsOptimised={text.countsOptimised}
          />
        ))}
        {text.stages.length < maxStages ? <Button variant="quiet" label="Add a stage at the hot end" onPress={() => setText(withStageAdded(text))} /> : <AppText tone="muted">{`${maxStages} stages is the most a cascade may have.`}</AppText>}
      </Section>
      <CoolerSaveBar shown={shown} tried={tried} busy={busy} error={error} isNew={savedId === null} onSave={onSave} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
  grid: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: spacing.md },
  field: { flexGrow: 1, flexBasis: 240 },
});
