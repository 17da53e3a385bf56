import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

const headers: Array<{ quantity: string; headers: string }> = [
  { quantity: 'Position from the cold end (required)', headers: 'position_mm · position_um' },
  { quantity: 'Seebeck coefficient', headers: 'seebeck_uV_per_K · seebeck_mV_per_K' },
  { quantity: 'Conductivity or resistivity', headers: 'sigma_S_per_cm · sigma_S_per_m · resistivity_uOhm_m · resistivity_mOhm_cm' },
  { quantity: 'Hall concentration (times the Hall factor: the carrier concentration)', headers: 'n_per_cm3' },
  { quantity: 'Temperature of the measurement (optional)', headers: 'temperature_K' },
];

export const exampleMeasurements = ['position_mm,seebeck_uV_per_K,sigma_S_per_cm', '0.10,186,1210', '0.30,184,1240', '…'].join('\n');

/** The CSV a grower uploads: position plus S and/or σ, or n, with units in the headers. */
export function MeasurementFormatHelp() {
  return (
    <View style={styles.help} testID="measurement-format-help">
      <AppText>
        One header row, then one row per measured position along the grown piece. Headers name the quantity and its unit as written; blank cells mean
        &quot;not measured here&quot;. Give Seebeck and/or conductivity, or a Hall carrier concentration, at each position.
      </AppText>
      <View style={styles.groups} role="list" aria-label="Accepted headers">
        {headers.map((g) => (
          <View key={g.quantity} role="listitem">
            <AppText variant="label">{g.quantity}</AppText>
            <AppText variant="mono" tone="muted">
              {g.headers}
            </AppText>
          </View>
        ))}
      </View>
      <AppText variant="mono" style={styles.example}>
        {exampleMeasurements}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  help: { gap: spacing.sm },
  groups: { gap: spacing.xs },
  example: { backgroundColor: colors.surfaceSunken, borderRadius: radii.md, padding: spacing.md },
});
