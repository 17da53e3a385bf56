import { StyleSheet, View } from 'react-native';
import type { Carrier } from '@/shared/api/families';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';
import { carrierLabel } from './family-labels';

const carrierColor = { p: colors.heat, n: colors.primary, none: colors.textFaint } as const;

/** "(+) p-type · holes": sign and words; the colour only repeats them. */
export function CarrierTag({ carrier }: { carrier: Carrier }) {
  const label = carrierLabel(carrier);
  const color = carrierColor[carrier ?? 'none'];
  return (
    <View style={styles.row}>
      <View style={[styles.sign, { borderColor: color }]}>
        <Glyph name={label.glyph} color={color} />
      </View>
      <AppText variant="label" tone="muted">
        {label.text}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  sign: {
    width: 22,
    height: 22,
    borderRadius: radii.pill,
    borderWidth: 1.5,
    alignItems: 'center',
    justifyContent: 'center',
  },
});
