import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Objective } from '@/shared/api/designs';
import { objectiveInfo } from '@/components/screens/runs/run-format';
import { LegSourceFields } from '@/components/screens/modules/leg-source-fields';
import { spacing } from '@/components/theme';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { Section } from '@/components/ui/form-section';
import { TextField } from '@/components/ui/text-field';
import { CoolerSaveBar, useCoolerSave, type SavedTo } from './cooler-save';
import { coupleInputFrom, usesColdSide, usesHeatLoad, type CoupleText } from './couple-form-model';

type Props = { initial: CoupleText; savedId: string | null; onSaved: (to: SavedTo) => void };

const objectives = (['maxDeltaT', 'maxHeatLoad', 'maxCop'] as const).map((value: Objective) => ({ value, label: objectiveInfo[value].goal }));
const ratios = [
  { value: 'free', label: 'Optimised' },
  { value: 'fixed', label: 'Fixed' },
] as const;

/** The matched-couple form: both legs, the conditions, the objective and the area ratio. */
export function CoupleEditor({ initial, savedId, onSaved }: Props) {
  const [text, setText] = useState(initial);
  const [tried, setTried] = useState(false);
  const { submit, busy, serverErrors, error } = useCoolerSave(savedId, onSaved);
  const { input, errors } = coupleInputFrom(text);
  const shown = tried ? { ...serverErrors, ...errors } : {};
  const set = (patch: Partial<CoupleText>) => setText({ ...text, ...patch });
  return (
    <View style={styles.wrap}>
      <Section title="Legs" hint="A leg design is optimised within its family and doping bounds together with the other leg; a run's leg or a family at uniform doping stays as it is.">
        <TextField id="couple-name" label="Name" value={text.name} onChangeText={(name) => set({ name })} error={shown.name} />
        <View style={styles.legs}>
          <LegSourceFields side="p" allowDesign value={text.p} onChange={(p) => set({ p })} errors={shown} />
          <LegSourceFields side="n" allowDesign value={text.n} onChange={(n) => set({ n })} errors={shown} />
        </View>
      </Section>
      <Section title="Conditions" hint="One current through both legs; the n/p area ratio sets how far each leg runs from its own best.">
        <ChoiceChips id="couple-objective" label="Objective" choices={objectives} value={text.objective} onChange={(objective) => set({ objective })} />
        <View style={styles.grid}>
          <View style={styles.field}>
            <TextField id="couple-hotSide" label="Heat sink Th" unit="K" mono value={text.hotSide} onChangeText={(hotSide) => set({ hotSide })} error={shown.hotSide} />
          </View>
          {usesHeatLoad(text.objective) ? (
            <View style={styles.field}>
              <TextField id="couple-heatLoad" label="Heat load per couple" unit="mW" mono value={text.heatLoadMw} onChangeText={(heatLoadMw) => set({ heatLoadMw })} error={shown.heatLoad} />
            </View>
          ) : null}
          {usesColdSide(text.objective) ? (
            <View style={styles.field}>
              <TextField id="couple-coldSide" label="Cold-side target Tc" unit="K" mono value={text.coldSide} onChangeText={(coldSide) => set({ coldSide })} error={shown.coldSide} />
            </View>
          ) : null}
        </View>
        <ChoiceChips id="couple-ratio" label="Area ratio A_n / A_p" choices={ratios} value={text.areaRatioFree ? 'free' : 'fixed'} onChange={(v) => set({ areaRatioFree: v === 'free' })} hint={text.areaRatioFree ? 'Chosen by the optimiser, the couple’s total cross-section kept.' : 'Held at the value below.'} />
        {text.areaRatioFree ? null : <TextField id="couple-areaRatio" label="Area ratio A_n / A_p" mono value={text.areaRatio} onChangeText={(areaRatio) => set({ areaRatio })} error={shown.areaRatio} />}
        <TextField id="couple-starts" label="Search starts" help="More starts search wider and take longer" mono value={text.starts} onChangeText={(starts) => set({ starts })} error={shown.starts} />
      </Section>
      <CoolerSaveBar shown={shown} tried={tried} busy={busy} error={error} isNew={savedId === null} onSave={(andLaunch) => {
        setTried(true);
        submit(input, andLaunch);
      }} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
  legs: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  grid: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: spacing.md },
  // As the cascade editor's: narrower, a field is squeezed below its input and unit and the unit spills out of the card.
  field: { flexGrow: 1, flexBasis: 240 },
});
