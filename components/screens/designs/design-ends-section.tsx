import { StyleSheet, View } from 'react-native';
import type { ParasiticKind } from '@/shared/api/designs';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { Section } from '@/components/ui/form-section';
import { AppText } from '@/components/ui/text';
import { designFieldInfo } from './design-fields';
import { Pair, type SectionProps } from './design-form-sections';
import { DesignNumberField } from './design-number-field';

const kinds: { kind: ParasiticKind; label: string; help: string }[] = [
  { kind: 'none', label: 'None', help: 'Only the load’s heat reaches the cold end.' },
  { kind: 'fixed', label: 'Fixed load', help: 'A constant heat load onto the cold end of each leg, besides the load (gas conduction is one).' },
  {
    kind: 'radiation',
    label: 'Radiation onto the sides',
    help: 'The leg’s sides (square cross-section) exchange radiation with surroundings at Ts: εσ(Ts⁴ − T⁴) per unit area, along the whole leg.',
  },
];

/**
 * The contacts at each end and the parasitic heat onto the cold side. Every
 * calculation of the design uses them: the optimiser, both baselines, the
 * growth sheet's zones and bands, as-grown predictions, curves and modules.
 */
export function EndsSection({ values, errors, onNumber, onChange }: SectionProps) {
  const row = { values, errors, onNumber };
  const chosen = kinds.find((k) => k.kind === values.parasitic) ?? kinds[0]!;
  return (
    <Section title="Contacts and parasitic heat" hint="Left at 0 and none, the leg is ideal: real contacts and heat leaks cost cooling.">
      <Pair>
        <DesignNumberField field="coldContactMicroOhmCm2" {...row} />
        <DesignNumberField field="hotContactMicroOhmCm2" {...row} />
      </Pair>
      <View style={styles.field}>
        <AppText variant="label" nativeID="parasitic-label">
          {designFieldInfo.parasitic.label}
        </AppText>
        <View style={styles.chips} role="radiogroup" aria-labelledby="parasitic-label">
          {kinds.map((k) => (
            <Chip key={k.kind} role="radio" label={k.label} selected={values.parasitic === k.kind} onPress={() => onChange({ parasitic: k.kind })} testID={`parasitic-${k.kind}`} />
          ))}
        </View>
        <AppText variant="caption" tone="muted">
          {chosen.help}
        </AppText>
      </View>
      {values.parasitic === 'fixed' ? <DesignNumberField field="parasiticLoadW" {...row} required /> : null}
      {values.parasitic === 'radiation' ? (
        <Pair>
          <DesignNumberField field="emissivity" {...row} required />
          <DesignNumberField field="surroundingsK" {...row} required />
        </Pair>
      ) : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
