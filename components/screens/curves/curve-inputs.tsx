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

type Props = { text: CurveInputText; onChange: (t: CurveInputText) => void; parsed: ParsedCurveInputs; hotSide: number };

export function CurveInputs({ text, onChange, parsed, hotSide }: Props) {
  const { errors } = parsed;
  return (
    <View style={styles.wrap}>
      <View style={styles.choice} role="radiogroup" aria-label="What fixes the load side">
        <Chip role="radio" label="Set ΔT" selected={text.by === 'deltaT'} onPress={() => onChange({ ...text, by: 'deltaT' })} testID="curve-by-delta-t" />
        <Chip role="radio" label="Set the cold side Tc" selected={text.by === 'coldSide'} onPress={() => onChange({ ...text, by: 'coldSide' })} testID="curve-by-cold-side" />
      </View>
      <View style={styles.row}>
        <View style={styles.field}>
          {text.by === 'deltaT' ? (
            <TextField
              id="curve-delta-t"
              label="Temperature difference ΔT"
              unit="K"
              mono
              keyboardType="numeric"
              value={text.deltaT}
              onChangeText={(deltaT) => onChange({ ...text, deltaT })}
              help="Heat sink minus load temperature"
              error={errors.deltaT}
            />
          ) : (
            <TextField
              id="curve-cold-side"
              label="Cold-side temperature Tc"
              unit="K"
              mono
              keyboardType="numeric"
              value={text.coldSide}
              onChangeText={(coldSide) => onChange({ ...text, coldSide })}
              help="The load's temperature, in kelvin"
              error={errors.coldSide}
            />
          )}
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
