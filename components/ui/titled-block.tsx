import type { ReactNode } from 'react';
import { type StyleProp, StyleSheet, View, type ViewStyle } from 'react-native';
import { spacing } from '@/components/theme';
import { boxMark } from './box-mark';
import { AppText } from './text';

export type TitledBlockProps = {
  title: string;
  /** How to read what follows, under the title. */
  hint?: string;
  /** The box around it, if any (a card, a grid cell). */
  style?: StyleProp<ViewStyle>;
  children: ReactNode;
  testID?: string;
};

/** One chart, table or diagram under a small heading (level 3) and an optional hint. */
export function TitledBlock({ title, hint, style, children, testID }: TitledBlockProps) {
  return (
    <View style={[styles.block, style]} testID={testID} {...boxMark}>
      <View style={styles.heading}>
        <AppText variant="bodyStrong" role="heading" aria-level={3}>
          {title}
        </AppText>
        {hint ? (
          <AppText variant="caption" tone="muted">
            {hint}
          </AppText>
        ) : null}
      </View>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: spacing.sm },
  heading: { gap: spacing.xxs },
});
