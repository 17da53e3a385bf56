import { useState, type ReactNode } from 'react';
import { type NativeScrollEvent, type NativeSyntheticEvent, Platform, ScrollView, StyleSheet, View, type ViewStyle } from 'react-native';
import { colors, spacing } from '@/components/theme';
import { AppText } from './text';

/**
 * Sticks a cell to the left edge of the nearest sideways scroller while the
 * rest of its row scrolls under it. Web only: react-native-web passes
 * `position: sticky` through to CSS; a device scrolls the cell along.
 */
export const stickyLeft: ViewStyle | null = Platform.OS === 'web' ? ({ position: 'sticky', left: 0, zIndex: 1 } as unknown as ViewStyle) : null;

/**
 * Marks for print stylesheets (`data-side-scroll`): on paper nothing
 * scrolls, so a printed page lets the scroller's content flow to the page
 * width and drops the fade and the cue. Spread on a view; devices ignore it.
 */
export const sideScrollMarks = {
  scroller: { dataSet: { sideScroll: 'scroller' } },
  fade: { dataSet: { sideScroll: 'fade' } },
  cue: { dataSet: { sideScroll: 'cue' } },
} as const;

/** Steps of the right-edge fade, lightest first (no gradient primitive in React Native). */
const fadeSteps = [0.25, 0.5, 0.75, 0.92];

type Size = { view: number; content: number; offset: number };

type SideScrollProps = {
  children: ReactNode;
  /**
   * The least width the content needs (a table: the sum of its columns).
   * The content gets exactly the card's width or this, whichever is more:
   * left to itself it would be as wide as its longest unwrapped line.
   */
  contentWidth: number;
  testID?: string;
  /** The card colour behind, for the fade. */
  surface?: string;
};

/**
 * Content wider than its card scrolls inside the card, never the page. While
 * more lies to the right, the right edge fades and a line under it says
 * "Scroll sideways for more →", so a cut-off column never looks like the end
 * of the table.
 */
export function SideScroll({ children, contentWidth, testID, surface = colors.surface }: SideScrollProps) {
  const [size, setSize] = useState<Size>({ view: 0, content: 0, offset: 0 });
  const overflows = size.content > size.view + 1;
  const moreRight = overflows && size.offset + size.view < size.content - 1;
  const onScroll = (e: NativeSyntheticEvent<NativeScrollEvent>) => {
    const offset = e.nativeEvent.contentOffset.x;
    setSize((s) => (s.offset === offset ? s : { ...s, offset }));
  };
  return (
    <View style={styles.wrap}>
      <View>
        <ScrollView
          horizontal
          testID={testID}
          {...sideScrollMarks.scroller}
          contentContainerStyle={{ width: Math.max(size.view, contentWidth) }}
          scrollEventThrottle={32}
          onScroll={onScroll}
          onLayout={(e) => {
            const view = e.nativeEvent.layout.width;
            setSize((s) => (s.view === view ? s : { ...s, view }));
          }}
          onContentSizeChange={(content) => setSize((s) => (s.content === content ? s : { ...s, content }))}
        >
          {children}
        </ScrollView>
        {moreRight ? (
          <View style={styles.fade} pointerEvents="none" testID="side-scroll-fade" {...sideScrollMarks.fade}>
            {fadeSteps.map((opacity) => (
              <View key={opacity} style={[styles.fadeStep, { backgroundColor: surface, opacity }]} />
            ))}
          </View>
        ) : null}
      </View>
      {overflows ? (
        <AppText variant="caption" tone="muted" style={styles.cue} testID="side-scroll-cue" {...sideScrollMarks.cue}>
          {moreRight ? 'Scroll sideways for more →' : '← Scroll back for the first columns'}
        </AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xxs },
  fade: { position: 'absolute', top: 0, bottom: 0, right: 0, width: 32, flexDirection: 'row' },
  fadeStep: { flex: 1 },
  cue: { alignSelf: 'flex-end' },
});
