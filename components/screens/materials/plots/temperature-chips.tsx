import { StyleSheet, View } from 'react-native';
import { chartMarks, spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { AppText } from '@/components/ui/text';

/** More temperatures than line styles would make curves ambiguous. */
export const maxTemperatures = chartMarks.length;

export type TemperatureChipsProps = {
  choices: number[];
  selected: number[];
  onChange: (next: number[]) => void;
};

/** Toggle which temperatures are plotted; at least one, at most one per line style. */
export function TemperatureChips({ choices, selected, onChange }: TemperatureChipsProps) {
  const toggle = (t: number) => {
    if (selected.includes(t)) {
      if (selected.length > 1) onChange(selected.filter((s) => s !== t));
      return;
    }
    if (selected.length < maxTemperatures) onChange([...selected, t].sort((a, b) => a - b));
  };
  return (
    <View style={styles.wrap}>
      <AppText variant="label" tone="muted" nativeID="plot-temperatures">
        Temperatures (K) · up to {maxTemperatures}
      </AppText>
      <View style={styles.row} role="group" aria-labelledby="plot-temperatures">
        {choices.map((t) => {
          const on = selected.includes(t);
          return (
            <Chip
              key={t}
              label={`${formatKelvin(t)} K`}
              selected={on}
              disabled={!on && selected.length >= maxTemperatures}
              onPress={() => toggle(t)}
            />
          );
        })}
      </View>
    </View>
  );
}

function formatKelvin(t: number): string {
  return String(Number(t.toFixed(1)));
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
