import { Component, type ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { defaultPlotHeight, type LinePlotProps } from './line-plot-types';

export type ChartFrameProps = Pick<LinePlotProps, 'xLabel' | 'yLabel' | 'description'> & {
  children: ReactNode;
  /** Under the x caption, e.g. a legend. */
  footer?: ReactNode;
};

/** Axis captions around the canvas, in the app's own type, plus a11y text. */
export function ChartFrame({ xLabel, yLabel, description, children, footer }: ChartFrameProps) {
  return (
    <View style={styles.frame} role="img" aria-label={description} testID="line-plot">
      <AppText variant="caption" tone="muted">
        {yLabel}
      </AppText>
      {children}
      <AppText variant="caption" tone="muted" style={styles.xLabel}>
        {xLabel}
      </AppText>
      {footer}
    </View>
  );
}

export function ChartLoading({ height = defaultPlotHeight }: { height?: number }) {
  return (
    <View style={[styles.placeholder, { height }]}>
      <ActivityIndicator color={colors.primary} />
      <AppText variant="caption" tone="muted">
        Loading the chart engine…
      </AppText>
    </View>
  );
}

type BoundaryState = { error: Error | null };

/** Keeps a chart that cannot load (e.g. no WebGL) from taking the screen down. */
export class ChartBoundary extends Component<{ children: ReactNode }, BoundaryState> {
  override state: BoundaryState = { error: null };

  static getDerivedStateFromError(error: Error): BoundaryState {
    return { error };
  }

  override render() {
    if (!this.state.error) return this.props.children;
    return (
      <View style={[styles.placeholder, styles.failed]} role="alert">
        <AppText variant="label" tone="danger">
          This chart could not be drawn in this browser.
        </AppText>
        <AppText variant="mono" tone="muted">
          {this.state.error.message}
        </AppText>
      </View>
    );
  }
}

const styles = StyleSheet.create({
  frame: { gap: spacing.xs },
  xLabel: { alignSelf: 'flex-end' },
  placeholder: {
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.sm,
    borderRadius: radii.md,
    backgroundColor: colors.surfaceSunken,
    padding: spacing.lg,
  },
  failed: { backgroundColor: colors.dangerSoft },
});
