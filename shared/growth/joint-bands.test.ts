import { optimizeLeg, parseCase } from '../engine';
import { mulberry32 } from '../random';
import { jointZoneBands, zoneTolerancesOneAtATime } from './zone-tolerance';
import { problemOf, scoreLayout, zoneProfile } from './zoning';
import type { ZoneLayout } from './zoned-leg';

/** The demo p-type band family (typical (Bi,Sb)₂Te₃ values, from memory) on the demo's 1.5 mm × 1 mm² leg, zones ≥ 0.2 mm. */
const material = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } as const;
const caseJson = { hotSide: 300, length: 1.5e-3, area: 1e-6, material, bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 }, controlPoints: 8 };
const c = parseCase(caseJson, 'optimize');
const optimum = optimizeLeg(c);
const steps = zoneProfile(c, { maxZones: 3, minZoneFraction: 0.2 / 1.5, continuous: { x: optimum.doping!.x, log10: optimum.doping!.perCm3.map(Math.log10) } });
const p = problemOf(c, 1e-8);
const three = steps[2]!;
const BUDGET = 1;

/** Re-solved loss (K of ΔT) at zone dopings log10, at the design's current, as the sheet promises it. */
const lossAt = (layout: ZoneLayout, current: number, target: number, log10: number[]): number => {
  const s = scoreLayout(p, { ...layout, log10 }, current);
  return s.feasible ? target - s.value : Infinity;
};
const logBand = (b: { lowPerCm3: number; highPerCm3: number }): [number, number] => [Math.log10(b.lowPerCm3), Math.log10(b.highPerCm3)];
const corners = (bands: Array<[number, number]>): number[][] =>
  Array.from({ length: 2 ** bands.length }, (_, m) => bands.map(([lo, hi], k) => ((m >> k) & 1 ? hi : lo)));

describe('tolerance bands for the whole leg (demo K = 3)', () => {
  const old = zoneTolerancesOneAtATime(p, three.layout, three.score, BUDGET).map(logBand);
  const joint = jointZoneBands(p, three.layout, three.score, BUDGET);
  const bands = joint.tolerances.map(logBand);
  const loss = (log10: number[]) => lossAt(three.layout, three.score.current, three.score.value, log10);

  it('the old one-zone-at-a-time bands break the budget when the zones sit at their edges together', () => {
    const worst = Math.max(...corners(old).map(loss));
    // The review found 2.8–3.4 K at the corners of these bands against a 1 K budget.
    expect(worst).toBeGreaterThan(2.5 * BUDGET);
    expect(joint.check.perZoneWorstCornerLoss).toBeCloseTo(worst, 6);
  });

  it('every corner of the joint bands, re-solved, loses no more than the budget', () => {
    expect(joint.check).toMatchObject({ method: 'all-corners', cornersSolved: 8 });
    const losses = corners(bands).map(loss);
    for (const l of losses) expect(l).toBeLessThanOrEqual(BUDGET + 1e-6);
    // Not needlessly tight: the bisection stops within 0.5 % of the scale, so the worst corner is close to the budget.
    expect(Math.max(...losses)).toBeGreaterThan(0.95 * BUDGET);
    expect(Math.max(...losses)).toBeCloseTo(joint.check.worstCornerLoss, 6);
  });

  it('random points inside the joint bands, re-solved, lose no more than the budget', () => {
    // Why corners suffice: near the optimum the loss is convex, and a convex function on a box is largest at a
    // vertex (R. T. Rockafellar, Convex Analysis, Princeton 1970, Cor. 32.3.2 — from memory); checked here, not assumed.
    const random = mulberry32(314);
    for (let i = 0; i < 150; i += 1) {
      const point = bands.map(([lo, hi]) => lo + random() * (hi - lo));
      expect(loss(point)).toBeLessThanOrEqual(BUDGET + 1e-6);
    }
  });

  it('shrinks each band towards its target by one common factor, keeping the one-zone bands\' shapes', () => {
    const s = joint.check.scale;
    expect(s).toBeGreaterThan(0.3);
    expect(s).toBeLessThan(1);
    bands.forEach(([lo, hi], k) => {
      const y = three.layout.log10[k]!;
      expect(lo - y).toBeCloseTo(s * (old[k]![0] - y), 9);
      expect(hi - y).toBeCloseTo(s * (old[k]![1] - y), 9);
    });
  });
});

describe('more than 6 zones: the sign-guided corner and the quadratic model\'s worst corners', () => {
  // Each of the K = 3 zones cut into two or three equal pieces: 7 zones, the same leg, the same optimum.
  const cut = (layout: ZoneLayout, parts: number[]): ZoneLayout => ({
    fractions: layout.fractions.flatMap((f, k) => Array<number>(parts[k]!).fill(f / parts[k]!)),
    log10: layout.log10.flatMap((y, k) => Array<number>(parts[k]!).fill(y)),
  });
  const seven = cut(three.layout, [3, 2, 2]);
  const score = scoreLayout(p, seven, three.score.current);
  const joint = jointZoneBands(p, seven, score, BUDGET);
  const bands = joint.tolerances.map(logBand);
  const loss = (log10: number[]) => lossAt(seven, three.score.current, score.value, log10);

  it('holds at every one of the 128 corners and at random interior points', () => {
    expect(joint.check.method).toBe('guided-corners');
    // The guided corner, the model's 31 worst (the guided one often among them) and the climb's neighbours.
    expect(joint.check.cornersSolved).toBeGreaterThanOrEqual(31);
    expect(joint.check.cornersSolved).toBeLessThan(128);
    for (const point of corners(bands)) expect(loss(point)).toBeLessThanOrEqual(BUDGET + 1e-6);
    const random = mulberry32(2718);
    for (let i = 0; i < 40; i += 1) expect(loss(bands.map(([lo, hi]) => lo + random() * (hi - lo)))).toBeLessThanOrEqual(BUDGET + 1e-6);
  });
});
