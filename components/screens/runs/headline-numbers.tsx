import { StyleSheet, View } from 'react-native';
import type { Objective } from '@/shared/api/designs';
import { spacing } from '@/components/theme';
import { FigureTiles, type FigureTile } from '@/components/ui/figure-tiles';
import { AppText } from '@/components/ui/text';
import { doping, formatObjective, objectiveInfo, quantity } from './run-format';
import type { RunResult } from './run-result';

function tiles(r: RunResult, objective: Objective): FigureTile[] {
  const list: FigureTile[] = [
    { key: 'deltaT', label: 'Temperature drop ΔT', value: quantity(r.deltaT, 'K'), lead: objective === 'maxDeltaT' },
    { key: 'coldSide', label: 'Cold side Tc', value: quantity(r.coldSide, 'K') },
    { key: 'current', label: 'Current I', value: quantity(r.current, 'A') },
    { key: 'voltage', label: 'Voltage V', value: quantity(r.voltage, 'V') },
    { key: 'power', label: 'Input power P', value: quantity(r.power, 'W') },
    { key: 'heatLoad', label: 'Heat load Qc', value: quantity(r.heatLoad, 'W'), lead: objective === 'maxHeatLoad' },
    { key: 'cop', label: 'COP', value: r.cop === null ? '– (no power)' : r.heatLoad === 0 ? '0 (no heat load)' : quantity(r.cop, ''), lead: objective === 'maxCop' },
    { key: 'heatRejected', label: 'Heat rejected Qh', value: quantity(r.heatRejected, 'W') },
  ];
  return list;
}

/** The converged leg's numbers, the optimised one first and highlighted by a frame and the word "objective". */
export function HeadlineNumbers({ result, objective }: { result: RunResult; objective: Objective }) {
  return <FigureTiles tiles={tiles(result, objective)} testID="headline-numbers" prefix="headline" />;
}

type GainRow = { key: string; name: string; gain: number; baseline: number; detail: string };

function gainRows(r: RunResult): GainRow[] {
  const b = r.baselines;
  if (!b) return [];
  const rows: GainRow[] = [];
  const u = b.uniform;
  rows.push({
    key: 'uniform',
    name: 'best uniform leg',
    gain: r.objective.value - u.objective,
    baseline: u.objective,
    detail: `${u.perCm3 === undefined ? 'one material' : doping(u.perCm3)} at ${quantity(u.current, 'A', 3)}`,
  });
  if (b.localBestZt) {
    const z = b.localBestZt;
    rows.push({ key: 'localBestZt', name: 'local-best-zT leg', gain: r.objective.value - z.objective, baseline: z.objective, detail: `at ${quantity(z.current, 'A', 3)}, doping for the best zT at each point` });
  }
  return rows;
}

/** "+14.1 K over the best uniform leg (73.2 K …)": what grading bought. */
export function Gains({ result, objective }: { result: RunResult; objective: Objective }) {
  const rows = gainRows(result);
  if (rows.length === 0) return <AppText tone="muted">This leg has no baselines to compare with (constant properties).</AppText>;
  const { symbol } = objectiveInfo[objective];
  return (
    <View style={styles.gains} testID="gains">
      {rows.map((g) => {
        const percent = g.baseline !== 0 ? ` (${g.gain >= 0 ? '+' : ''}${((100 * g.gain) / Math.abs(g.baseline)).toFixed(1)} %)` : '';
        return (
          <View key={g.key} style={styles.gainRow} testID={`gain-${g.key}`}>
            <AppText variant="heading">{`${g.gain >= 0 ? '+' : ''}${formatObjective(objective, g.gain, 4)}${percent}`}</AppText>
            <AppText tone="muted">{`${symbol} over the ${g.name}: ${formatObjective(objective, g.baseline)}, ${g.detail}`}</AppText>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  gains: { gap: spacing.md },
  gainRow: { gap: spacing.xxs },
});
