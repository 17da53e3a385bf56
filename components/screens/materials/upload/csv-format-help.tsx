import { StyleSheet, View } from 'react-native';
import { maxUploadBytes } from '@/shared/api/family-upload';
import { tableLimits } from '@/shared/engine/table-limits';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

/** Accepted header names, by quantity: `<quantity>_<unit>`. */
const headerGroups: Array<{ quantity: string; headers: string }> = [
  { quantity: 'Carrier concentration', headers: 'n_per_cm3 · doping_per_cm3 · carrier_concentration_per_cm3 · n_per_m3' },
  { quantity: 'Temperature', headers: 'temperature_K · temperature_C' },
  { quantity: 'Seebeck coefficient', headers: 'seebeck_uV_per_K · seebeck_mV_per_K · seebeck_V_per_K' },
  {
    quantity: 'Electrical conductivity or resistivity',
    headers: 'sigma_S_per_cm · sigma_S_per_m · resistivity_uOhm_m · resistivity_mOhm_cm · resistivity_Ohm_m',
  },
  { quantity: 'Thermal conductivity', headers: 'kappa_W_per_m_K' },
];

export const exampleCsv = [
  'n_per_cm3,temperature_K,seebeck_uV_per_K,sigma_S_per_cm,kappa_W_per_m_K',
  '1e19,300,215,720,1.42',
  '1e19,350,228,610,1.35',
  '…',
].join('\n');

/** The header grammar, stated before anyone uploads. */
export function CsvFormatHelp() {
  return (
    <View style={styles.help} testID="csv-format-help">
      <AppText>
        One header row, then one row per measured point. Separate columns with commas or semicolons, in any order. Each header
        names the quantity and its unit as <AppText variant="mono">quantity_unit</AppText>; units are converted exactly as
        written and a header without a recognised unit is an error, never a guess. Upper or lower case; µ may be written u.
      </AppText>
      <View style={styles.groups} role="list" aria-label="Accepted headers">
        {headerGroups.map((g) => (
          <View key={g.quantity} style={styles.group} role="listitem">
            <AppText variant="label">{g.quantity}</AppText>
            <AppText variant="mono" tone="muted">
              {g.headers}
            </AppText>
          </View>
        ))}
      </View>
      <AppText variant="label">Example</AppText>
      <AppText variant="mono" style={styles.example}>
        {exampleCsv}
      </AppText>
      <AppText variant="caption" tone="muted">
        {`Every doping should be measured at every temperature (a full grid); the preview shows which points are missing. Up to ${maxUploadBytes / 1024 / 1024} MB, ${tableLimits.rows} rows, ${tableLimits.dopings} dopings and ${tableLimits.temperatures} temperatures.`}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  help: { gap: spacing.sm },
  groups: { gap: spacing.xs },
  group: { gap: spacing.xxs },
  example: {
    backgroundColor: colors.surfaceSunken,
    borderRadius: radii.md,
    padding: spacing.md,
  },
});
