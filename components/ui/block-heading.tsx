import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { AppText } from './text';

/** A heading over content that brings its own cards (e.g. a grid of charts). */
export function BlockHeading({ title, hint }: { title: string; hint?: string }) {
  return (
    <View style={styles.heading}>
      <AppText variant="heading" role="heading" aria-level={2}>
        {title}
      </AppText>
      {hint ? <AppText tone="muted">{hint}</AppText> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xxs, marginTop: spacing.sm },
});
