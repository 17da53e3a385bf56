import { StyleSheet, View } from 'react-native';
import { useDesigns } from '@/components/api/designs';
import { doping, quantity } from '@/components/screens/runs/run-format';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { ErrorLine } from '@/components/ui/field-parts';
import { AppText } from '@/components/ui/text';

type Props = { side: 'p' | 'n'; designId: string; onPick: (designId: string) => void; error?: string; idPrefix?: string };

/**
 * A leg design whose family has this leg's carrier: the matched couple
 * optimises its profile within the design's family, doping bounds and
 * control points (length, area and contacts from the design).
 */
export function DesignLegPicker({ side, designId, onPick, error, idPrefix = '' }: Props) {
  const id = `${idPrefix}${side}`;
  const designs = useDesigns();
  const all = designs.data?.designs ?? [];
  const choices = all.filter((d) => d.id === designId || d.carrier === side || d.carrier === null);
  return (
    <View style={styles.wrap} testID={`${id}-design-picker`}>
      <AppText variant="label">{`Leg design (${side}-type family)`}</AppText>
      {designs.isPending ? <AppText tone="muted">Loading designs…</AppText> : null}
      {!designs.isPending && choices.length === 0 ? <AppText tone="muted">{`No ${side}-type leg designs yet: make one under Designs, or use a fixed leg.`}</AppText> : null}
      <View style={styles.chips} role="radiogroup" aria-label={`Leg design for the ${side}-type leg`}>
        {choices.map((d) => (
          <Chip
            key={d.id}
            role="radio"
            label={`${d.name} · ${quantity(d.lengthMm, 'mm')} × ${quantity(d.areaMm2, 'mm²')} · ${doping(d.minPerCm3)} – ${doping(d.maxPerCm3)}`}
            selected={d.id === designId}
            onPress={() => onPick(d.id)}
            testID={`${id}-design-${d.id}`}
          />
        ))}
      </View>
      <ErrorLine message={error} testID={`${id}-design-error`} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
});
