import { StyleSheet, View } from 'react-native';
import type { RunBipolar } from '@/shared/api/runs';
import { BIPOLAR_SHARE } from '@/shared/engine';
import { formatNumber, formatScientific } from '@/components/format/number';
import { colors, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';

/** "12 %", "4.6 %", "0.03 %". */
function percent(share: number): string {
  return `${formatNumber(100 * share, share < 0.1 ? 2 : 3)} %`;
}

/** "the hot end", "the cold end" or "x = 0.62 mm". */
function where(b: RunBipolar): string {
  if (b.end) return `the ${b.end} end`;
  return `x = ${formatNumber(b.x * 1000, 3)} mm`;
}

/** Measured tables and constant legs say nothing about bands. */
export type BandCount = 'one band' | 'two bands' | 'not a band model';

/** One line on where the leg stands against bipolar conduction, for the run page and the lists. */
export function bipolarText(b: RunBipolar): string {
  const at = `${where(b)} (${formatNumber(b.temperature, 4)} K, n = ${formatScientific(b.perCm3, 2)} cm⁻³)`;
  return b.bipolar
    ? `In the bipolar region: at ${at} minority carriers carry ${percent(b.share)} of the current.`
    : `Outside the bipolar region: minority carriers carry at most ${percent(b.share)} of the current, at ${at}.`;
}

/** A run in a list: a short line, in the heat colour with a warning glyph when the profile is bipolar. */
export function BipolarLine({ bipolar }: { bipolar: RunBipolar | null }) {
  if (!bipolar) return null;
  return (
    <View style={styles.line} testID="run-bipolar">
      {bipolar.bipolar ? <Glyph name="bang" color={colors.heat} label="Bipolar" /> : null}
      <AppText variant="caption" tone={bipolar.bipolar ? 'heat' : 'muted'} style={styles.text}>
        {bipolarText(bipolar)}
      </AppText>
    </View>
  );
}

/**
 * The run page: a warning when the profile enters the bipolar region, a
 * quiet line when it stays out, and a word when the family cannot say.
 */
export function BipolarNotice({ bipolar, bands }: { bipolar: RunBipolar | null; bands: BandCount }) {
  if (bands === 'not a band model') return null;
  if (bands === 'one band') {
    return (
      <AppText variant="caption" tone="muted" testID="run-bipolar">
        The family has one band: bipolar conduction (carriers excited across the gap, which lower S at a hot, lightly doped end) is not modelled. Give it a minority band to see it.
      </AppText>
    );
  }
  if (!bipolar) return null;
  if (!bipolar.bipolar) return <BipolarLine bipolar={bipolar} />;
  return (
    <Notice tone="warning" title="Bipolar conduction in this leg" testID="run-bipolar">
      <AppText>{bipolarText(bipolar)}</AppText>
      <AppText tone="muted">
        {`Above ${percent(BIPOLAR_SHARE)} the minority carriers pull the Seebeck coefficient down and add bipolar heat conduction; the prediction there rests on the family's band gap and minority mobility, so measure S at that doping and temperature before building.`}
      </AppText>
    </Notice>
  );
}

const styles = StyleSheet.create({
  line: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xs },
  text: { flex: 1 },
});
