import { StyleSheet, View } from 'react-native';
import { IBMPlexMono_400Regular } from '@expo-google-fonts/ibm-plex-mono/400Regular';
import { useFont } from '@shopify/react-native-skia';
import { CartesianChart, Line } from 'victory-native';
import { formatTick } from '@/components/format/number';
import { colors } from '@/components/theme';
import { defaultPlotHeight, type LinePlotProps } from './line-plot-types';

const tickFontSize = 11;

/**
 * The Skia drawing itself. Import it only through `LinePlot`: on the web it
 * must not be evaluated before CanvasKit has loaded.
 */
export default function LinePlotCanvas({ points, height = defaultPlotHeight }: LinePlotProps) {
  // A bundled file (a URL string on the web, an asset id on devices).
  const font = useFont(IBMPlexMono_400Regular, tickFontSize);
  return (
    <View style={[styles.canvas, { height }]}>
      <CartesianChart
        data={points}
        xKey="x"
        yKeys={['y']}
        domainPadding={{ top: 12, bottom: 4 }}
        xAxis={{ font, labelColor: colors.textMuted, lineColor: colors.border, tickCount: 6, formatXLabel: (v) => formatTick(Number(v)) }}
        yAxis={[{ font, labelColor: colors.textMuted, lineColor: colors.border, tickCount: 5, formatYLabel: (v) => formatTick(Number(v)) }]}
      >
        {({ points: drawn }) => (
          <Line points={drawn.y} color={colors.heat} strokeWidth={2.5} curveType="natural" />
        )}
      </CartesianChart>
    </View>
  );
}

const styles = StyleSheet.create({
  canvas: { width: '100%' },
});
