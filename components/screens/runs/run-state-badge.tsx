import type { RunState } from '@/shared/api/runs';
import { colors } from '@/components/theme';
import { StateBadge, type StateLook } from '@/components/ui/state-badge';

/** Each state has a sign and a word; colour only repeats what they say. */
export const runStateLook: Record<RunState, StateLook> = {
  queued: { label: 'Queued', glyph: 'ring', color: colors.textMuted, meaning: 'waiting for a worker' },
  running: { label: 'Running', glyph: 'chevron-right', color: colors.primary, meaning: 'a worker is optimising' },
  succeeded: { label: 'Succeeded', glyph: 'check', color: colors.ok, meaning: 'converged; result stored' },
  failed: { label: 'Failed', glyph: 'cross', color: colors.danger, meaning: 'stopped with an error' },
  cancelled: { label: 'Cancelled', glyph: 'minus', color: colors.heat, meaning: 'stopped on request; best so far kept' },
};

export type RunStateBadgeProps = { state: RunState; size?: 'small' | 'large'; testID?: string };

/** "✓ Succeeded": the run's state as a sign and a word (and, large, what it means). */
export function RunStateBadge({ state, size = 'small', testID }: RunStateBadgeProps) {
  const look = runStateLook[state];
  return <StateBadge look={look} size={size} testID={testID} accessibilityLabel={`State: ${look.label}`} />;
}
