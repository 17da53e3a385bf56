/** What the pyramid draws of one stage. */
export type PyramidStage = { couples: number; coldSide: number; hotSide: number };

export type PyramidBar = PyramidStage & {
  /** 1 = the coldest stage. */
  number: number;
  /** Bar width as a share of the drawing's width: couples / the scale's couples. */
  widthShare: number;
};

/**
 * The bars of a cascade drawn to scale, coldest on top: each width is the
 * stage's couple count over `scaleCouples` (by default the largest stage,
 * which then fills the width). Pyramids shown side by side share one scale
 * (the largest stage of all), so a bar twice as wide has twice the couples
 * whichever cascade it belongs to.
 */
export function pyramidBars(stages: readonly PyramidStage[], scaleCouples?: number): PyramidBar[] {
  const scale = scaleCouples ?? Math.max(0, ...stages.map((s) => s.couples));
  return stages.map((s, i) => ({ ...s, number: i + 1, widthShare: scale > 0 ? Math.min(1, s.couples / scale) : 0 }));
}

/** The largest stage over several cascades: one scale for pyramids compared side by side. */
export function sharedScale(cascades: readonly (readonly PyramidStage[])[]): number {
  return Math.max(0, ...cascades.flatMap((stages) => stages.map((s) => s.couples)));
}
