import type { GrowthOrderDto, GrowthState } from '../api/growth';

/** What the grower's next step depends on: the sheet's state and how many measurement uploads the order holds. */
export type StepFacts = { sheetStatus: GrowthOrderDto['sheetStatus']; uploads: number };

/** What is missing for a step, naming the field the API reports it under. */
export type StepBlocker = { field: 'sheet' | 'measurements'; message: string };

/**
 * Why the grower may not yet move an order to `next`, in the grower's words;
 * null when the step may be taken. The client disables the step's button with
 * this message and the API refuses the same step with it, so neither can be
 * taken early: the steps cannot be undone.
 */
export function stepBlocker(next: Exclude<GrowthState, 'approved' | 'rejected'>, facts: StepFacts): StepBlocker | null {
  if (next === 'growing' && facts.sheetStatus !== 'ready') {
    return { field: 'sheet', message: facts.sheetStatus === 'failed' ? 'the growth sheet failed: growing needs its zones and bands — ask the physicist to recompute it' : 'the growth sheet is still computing: growing needs its zones and bands' };
  }
  if (next === 'measured' && facts.uploads === 0) {
    return { field: 'measurements', message: 'upload the as-grown measurements first: an order is measured once at least one upload is in' };
  }
  return null;
}
