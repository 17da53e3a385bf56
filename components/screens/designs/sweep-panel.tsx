import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import type { Design } from '@/shared/api/designs';
import { useLaunchSweep } from '@/components/api/runs';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Chip } from '@/components/ui/chip';
import { Section } from '@/components/ui/form-section';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { sweepParameterInfo, type SweepParameter } from '../runs/run-format';
import { checkSweep, parseValueList } from './sweep-model';

const parameters = Object.keys(sweepParameterInfo) as SweepParameter[];

/** Which parameters make sense for the design's objective (a heat-load objective computes Qc). */
function sweepable(design: Design): SweepParameter[] {
  return parameters.filter((p) => !(p === 'heatLoad' && design.objective === 'maxHeatLoad'));
}

/** Pick one parameter, list its values, launch one run per value (they run in parallel across workers). */
export function SweepPanel({ design }: { design: Design }) {
  const router = useRouter();
  const launch = useLaunchSweep();
  const [parameter, setParameter] = useState<SweepParameter>('hotSide');
  const [text, setText] = useState('');
  const [problem, setProblem] = useState<string | undefined>();
  const info = sweepParameterInfo[parameter];
  const count = parseValueList(text).length;
  const submit = () => {
    const check = checkSweep(design, parameter, text);
    setProblem(check.ok ? undefined : check.message);
    if (check.ok) launch.mutate({ designId: design.id, body: check.request }, { onSuccess: ({ sweep }) => router.push(`/sweeps/${sweep.id}`) });
  };
  return (
    <Section title="Sweep a parameter" hint="One run per value, all queued at once; the sweep page plots the optimum against the value.">
      <View style={styles.chips} role="radiogroup" aria-label="Parameter to sweep">
        {sweepable(design).map((p) => (
          <Chip key={p} role="radio" label={`${sweepParameterInfo[p].label} (${sweepParameterInfo[p].unit})`} selected={p === parameter} onPress={() => setParameter(p)} />
        ))}
      </View>
      <TextField
        id="sweep-values"
        label={`Values of ${info.label.toLowerCase()}`}
        unit={info.unit}
        help={`Separated by commas or spaces, ${info.help}.`}
        value={text}
        onChangeText={(t) => {
          setText(t);
          setProblem(undefined);
        }}
        error={problem}
        mono
      />
      {launch.error ? (
        <Notice tone="danger" title="Sweep not launched">
          <AppText>{launch.error.message}</AppText>
        </Notice>
      ) : null}
      <Button label={launch.isPending ? 'Launching…' : count >= 2 ? `Launch sweep of ${count} runs` : 'Launch sweep'} onPress={submit} disabled={launch.isPending} />
    </Section>
  );
}

const styles = StyleSheet.create({
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
