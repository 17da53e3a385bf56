import { growerStates, type GrowthOrderDto, type GrowthState } from '@/shared/api/growth';
import { colors } from '@/components/theme';
import type { StateLook } from '@/components/ui/state-badge';

export type Look = StateLook;

/** Each state has a sign and a word; colour only repeats them. */
export const growthStateLook: Record<GrowthState, Look> = {
  requested: { label: 'Requested', glyph: 'ring', color: colors.textMuted, meaning: 'waiting for a grower to accept' },
  accepted: { label: 'Accepted', glyph: 'chevron-right', color: colors.primary, meaning: 'a grower has taken it on' },
  growing: { label: 'Growing', glyph: 'chevron-right', color: colors.primary, meaning: 'the crystal is being grown' },
  grown: { label: 'Grown', glyph: 'chevron-right', color: colors.primary, meaning: 'grown; to be measured' },
  measured: { label: 'Measured', glyph: 'bang', color: colors.heat, meaning: 'measured; waiting for the physicist' },
  approved: { label: 'Approved', glyph: 'check', color: colors.ok, meaning: 'closed: the piece is accepted' },
  rejected: { label: 'Rejected', glyph: 'cross', color: colors.danger, meaning: 'closed: the piece is not accepted' },
};

export const sheetStatusLook: Record<GrowthOrderDto['sheetStatus'], Look> = {
  computing: { label: 'Sheet computing', glyph: 'ring', color: colors.textMuted, meaning: 'a worker is zoning the profile' },
  ready: { label: 'Sheet ready', glyph: 'check', color: colors.ok, meaning: 'zones and tolerances computed' },
  failed: { label: 'Sheet failed', glyph: 'cross', color: colors.danger, meaning: 'the sheet could not be computed' },
};

export type GrowerState = (typeof growerStates)[number];
export type NextState = Exclude<GrowerState, 'requested'>;

export const isClosed = (state: GrowthState) => state === 'approved' || state === 'rejected';

/** The state a grower may move the order to next, or null once measured or closed. */
export function nextState(state: GrowthState): NextState | null {
  const at = growerStates.indexOf(state as GrowerState);
  if (at < 0 || at + 1 >= growerStates.length) return null;
  return growerStates[at + 1] as NextState;
}

/** The grower's button for each step, as a verb. */
export const advanceLabel: Record<NextState, string> = {
  accepted: 'Accept the order',
  growing: 'Start growing',
  grown: 'Mark as grown',
  measured: 'Mark as measured',
};

/** Open orders first (by due date, undated last), then closed ones, newest first. */
export function sortOrders(orders: readonly GrowthOrderDto[]): GrowthOrderDto[] {
  const due = (o: GrowthOrderDto) => o.dueDate ?? '9999-12-31';
  return [...orders].sort((a, b) => {
    const closed = Number(isClosed(a.state)) - Number(isClosed(b.state));
    if (closed !== 0) return closed;
    if (!isClosed(a.state)) return due(a).localeCompare(due(b)) || b.createdAt.localeCompare(a.createdAt);
    return b.updatedAt.localeCompare(a.updatedAt);
  });
}
