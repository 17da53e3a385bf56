import { StyleSheet, View } from 'react-native';
import { formatNumber } from '@/components/format/number';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';

/** The load's side is fixed either by ΔT (sink minus load) or by the load temperature Tc itself. */
export type CurveInputText = { by: 'deltaT' | 'coldSide'; deltaT: string; coldSide: string; currentLimit: string };

export type ParsedCurveInputs = { deltaT: number | null; currentLimit: number | null; errors: Partial<Record<'deltaT' | 'coldSide' | 'currentLimit', string>> };

export const defaultCurveText: CurveInputText = { by: 'deltaT', deltaT: '30', coldSide: '270', currentLimit: '' };

/** ΔT from 0 to 300 K, or Tc above 0 K and at most Th; the limit is optional and positive. Messages name the field. */
export function parseCurveInputs(text: CurveInputText, hotSide: number): ParsedCurveInputs {
  const errors: ParsedCurveInputs['errors'] = {};
  let deltaT: number | null = null;
  if (text.by === 'deltaT') {
    const dT = Number(text.deltaT);
    if (text.deltaT.trim() !== '' && Number.isFinite(dT) && dT >= 0 && dT < 300) deltaT = dT;
    else errors.deltaT = 'ΔT must be a number of kelvin from 0 to 300 K';
  } else {
    const tc = Number(text.coldSide);
    if (text.coldSide.trim() !== '' && Number.isFinite(tc) && tc > 0 && tc <= hotSide) deltaT = hotSide - tc;
    else errors.coldSide = `The cold-side temperature Tc must be a number of kelvin above 0 K and at most Th = ${formatNumber(hotSide, 4)} K`;
  }
  let currentLimit: number | null = null;
  if (text.currentLimit.trim() !== '') {
    const limit = Number(text.currentLimit);
    if (Number.isFinite(limit) && limit > 0) currentLimit = limit;
    else errors.currentLimit = 'The current limit must be a positive number of amperes, or empty';
  }
  return { deltaT, currentLimit, errors };
}

/** The one field that fixes the load side, by what the user chose. */
const loadSide = {
  deltaT: { field: 'deltaT', id: 'curve-delta-t', label: 'Temperature difference ΔT', help: 'Heat sink minus load temperature' },
  coldSide: { field: 'coldSide', id: 'curve-cold-side', label: 'Cold-side temperature Tc', help: "The load's temperature, in kelvin" },
} as const;

type Props = { text: CurveInputText; onChange: (t: CurveInputText) => void; parsed: ParsedCurveInputs; hotSide: number };

export function CurveInputs({ text, onChange, parsed, hotSide }: Props) {
  const { errors } = parsed;
  const side = loadSide[text.by];
  return (
    <View style={styles.wrap}>
      <View style={styles.choice} role="radiogroup" aria-label="What fixes the load side">
        <Chip role="radio" label="Set ΔT" selected={text.by === 'deltaT'} onPress={() => onChange({ ...text, by: 'deltaT' })} testID="curve-by-delta-t" />
        <Chip role="radio" label="Set the cold side Tc" selected={text.by === 'coldSide'} onPress={() => onChange({ ...text, by: 'coldSide' })} testID="curve-by-cold-side" />
      </View>
      <View style={styles.row}>
        <View style={styles.field}>
          <TextField
            key={side.id}
            id={side.id}
            label={side.label}
            unit="K"
            mono
            keyboardType="numeric"
            value={text[side.field]}
            onChangeText={(v) => onChange({ ...text, [side.field]: v })}
            help={side.help}
            error={errors[side.field]}
          />
          {text.by === 'coldSide' && parsed.deltaT !== null ? (
            <AppText variant="caption" tone="muted" testID="curve-derived-delta-t">{`ΔT = Th − Tc = ${formatNumber(hotSide, 4)} K − ${formatNumber(hotSide - parsed.deltaT, 4)} K = ${formatNumber(parsed.deltaT, 4)} K`}</AppText>
          ) : null}
        </View>
        <View style={styles.field}>
          <TextField
            id="curve-current-limit"
            label="Current limit (optional)"
            unit="A"
            mono
            keyboardType="numeric"
            value={text.currentLimit}
            onChangeText={(currentLimit) => onChange({ ...text, currentLimit })}
            help="Supply or wire limit; currents above it are flagged"
            error={errors.currentLimit}
          />
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  choice: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  field: { flexGrow: 1, flexBasis: 220, gap: spacing.xxs },
});
