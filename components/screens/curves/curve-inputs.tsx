import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { TextField } from '@/components/ui/text-field';

export type CurveInputText = { deltaT: string; currentLimit: string };

export type ParsedCurveInputs = { deltaT: number | null; currentLimit: number | null; errors: Partial<Record<keyof CurveInputText, string>> };

/** ΔT ≥ 0 K; the limit is optional and positive. Messages name the field. */
export function parseCurveInputs(text: CurveInputText): ParsedCurveInputs {
  const errors: ParsedCurveInputs['errors'] = {};
  const dT = Number(text.deltaT);
  const deltaT = text.deltaT.trim() !== '' && Number.isFinite(dT) && dT >= 0 && dT < 300 ? dT : null;
  if (deltaT === null) errors.deltaT = 'ΔT must be a number of kelvin from 0 to 300 K';
  let currentLimit: number | null = null;
  if (text.currentLimit.trim() !== '') {
    const limit = Number(text.currentLimit);
    if (Number.isFinite(limit) && limit > 0) currentLimit = limit;
    else errors.currentLimit = 'The current limit must be a positive number of amperes, or empty';
  }
  return { deltaT, currentLimit, errors };
}

export function CurveInputs({ text, onChange, errors }: { text: CurveInputText; onChange: (t: CurveInputText) => void; errors: ParsedCurveInputs['errors'] }) {
  return (
    <View style={styles.row}>
      <View style={styles.field}>
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
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  field: { flexGrow: 1, flexBasis: 220 },
});
