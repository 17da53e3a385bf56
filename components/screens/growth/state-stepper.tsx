import { StyleSheet, View } from 'react-native';
import { growerStates, type GrowthState } from '@/shared/api/growth';
import { useIsWide } from '@/components/shell/use-is-wide';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph, type GlyphName } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';
import { growthStateLook, isClosed } from './growth-state';

type Step = { key: string; label: string; status: 'done' | 'current' | 'todo'; glyph: GlyphName; color: string };

/** The grower's five steps, then the physicist's verdict, each marked done, current or to do. */
export function stepsOf(state: GrowthState): Step[] {
  const at = isClosed(state) ? growerStates.length : growerStates.indexOf(state as (typeof growerStates)[number]);
  const steps: Step[] = growerStates.map((s, i) => {
    const status = i < at ? 'done' : i === at ? 'current' : 'todo';
    return { key: s, label: growthStateLook[s].label, status, glyph: status === 'todo' ? 'ring' : 'check', color: status === 'todo' ? colors.textFaint : colors.primary };
  });
  const verdict = isClosed(state) ? growthStateLook[state] : null;
  steps.push(
    verdict
      ? { key: 'closed', label: verdict.label, status: 'current', glyph: verdict.glyph, color: verdict.color }
      : { key: 'closed', label: 'Approved or rejected', status: 'todo', glyph: 'ring', color: colors.textFaint },
  );
  return steps;
}

const statusWord = { done: 'done', current: 'now', todo: 'to do' } as const;

/** Where the order stands: requested → accepted → growing → grown → measured → verdict. */
export function StateStepper({ state }: { state: GrowthState }) {
  const steps = stepsOf(state);
  // Connectors read as a line only on one row; wrapped on a phone, the numbers carry the order.
  const wide = useIsWide();
  return (
    <View style={styles.row} role="list" aria-label="Order progress" testID="state-stepper">
      {steps.map((s, i) => (
        <View key={s.key} style={styles.item} role="listitem" aria-current={s.status === 'current' ? 'step' : undefined}>
          {i > 0 && wide ? <View style={[styles.link, s.status !== 'todo' && styles.linkDone]} /> : null}
          <View style={[styles.step, s.status === 'current' && [styles.current, { borderColor: s.color }]]}>
            <Glyph name={s.glyph} color={s.color} />
            <AppText variant="label" style={s.status === 'todo' ? styles.todoText : { color: s.status === 'current' ? s.color : colors.text }}>
              {`${i + 1} ${s.label}`}
            </AppText>
            <AppText variant="caption" tone="muted">
              {statusWord[s.status]}
            </AppText>
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', rowGap: spacing.sm, columnGap: spacing.xs },
  item: { flexDirection: 'row', alignItems: 'center' },
  link: { width: spacing.sm, height: 0, borderTopWidth: 2, borderColor: colors.border },
  linkDone: { borderColor: colors.primary },
  step: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.xs,
    paddingHorizontal: spacing.sm,
    paddingVertical: spacing.xs,
    borderRadius: radii.pill,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.surface,
  },
  current: { borderWidth: 2 },
  todoText: { color: colors.textFaint },
});
