/**
 * `npm run bench` (growth): what the sheet's joint tolerance bands and its
 * yield cost on the demo's K = 3 sheet (the demo p family on a 1.5 mm leg,
 * zones ≥ 0.2 mm, Th = 300 K, bounds 1e18–1e20 cm⁻³). Figures printed, never
 * asserted: the one-zone-at-a-time bands and their worst corner, the joint
 * bands (time, leg solves, common scale, worst re-solved corner), the Monte
 * Carlo of 600 as-grown legs at 0.05 decades (time, yield), and a whole
 * sheet (K = 1…6) as the worker builds it.
 */
import { cpus, loadavg } from 'node:os';
import { optimizeLeg, parseCase } from '../../shared/engine';
import { buildGrowthSheet } from '../../shared/growth/growth-sheet';
import { estimateYield, YIELD_SAMPLES } from '../../shared/growth/growth-yield';
import { jointZoneBands, zoneTolerancesOneAtATime } from '../../shared/growth/zone-tolerance';
import { problemOf, scoreLayout, zoneProfile } from '../../shared/growth/zoning';

const material = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } as const;
const caseJson = { hotSide: 300, length: 1.5e-3, area: 1e-6, material, bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 }, controlPoints: 8 };

function timed<T>(fn: () => T, runs: number): { median: number; fastest: number; result: T } {
  let result = fn();
  const ms: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const t = performance.now();
    result = fn();
    ms.push(performance.now() - t);
  }
  ms.sort((a, b) => a - b);
  return { median: ms[Math.floor(ms.length / 2)]!, fastest: ms[0]!, result };
}

const c = parseCase(caseJson, 'optimize');
const optimum = optimizeLeg(c);
const continuous = { x: optimum.doping!.x, log10: optimum.doping!.perCm3.map(Math.log10) };
const three = zoneProfile(c, { maxZones: 3, minZoneFraction: 0.2 / 1.5, continuous })[2]!;
const p = problemOf(c, 1e-8);
const BUDGET = 1;

console.log(`growth sheet bench — ${cpus().length} cores, load ${loadavg().map((l) => l.toFixed(1)).join(' ')}`);
console.log(`demo K = 3: ΔT ${three.score.deltaT.toFixed(3)} K at ${three.score.current.toFixed(3)} A, zones ${three.layout.fractions.map((f) => (f * 1.5).toFixed(3)).join(' / ')} mm`);

const old = zoneTolerancesOneAtATime(p, three.layout, three.score, BUDGET);
const corners = (bands: typeof old): number[] => Array.from({ length: 8 }, (_, m) => {
  const log10 = bands.map((b, k) => Math.log10((m >> k) & 1 ? b.highPerCm3 : b.lowPerCm3));
  return three.score.value - scoreLayout(p, { ...three.layout, log10 }, three.score.current).value;
});
const oldCorners = corners(old);
console.log(`one zone at a time: corner losses ${Math.min(...oldCorners).toFixed(2)}–${Math.max(...oldCorners).toFixed(2)} K against a ${BUDGET} K budget`);

const joint = timed(() => jointZoneBands(p, three.layout, three.score, BUDGET), 5);
const newCorners = corners(joint.result.tolerances);
console.log(`joint bands: ${joint.median.toFixed(0)} ms median (fastest ${joint.fastest.toFixed(0)} ms), ${joint.result.evaluations} leg solves, scale ${joint.result.check.scale.toFixed(3)}, corners re-solved ${joint.result.check.cornersSolved}, corner losses ${Math.min(...newCorners).toFixed(3)}–${Math.max(...newCorners).toFixed(3)} K`);
joint.result.tolerances.forEach((t, k) => console.log(`  zone ${k + 1}: ${t.perCm3.toExponential(3)} cm⁻³, band ${t.lowPerCm3.toExponential(3)}–${t.highPerCm3.toExponential(3)} (one at a time ${old[k]!.lowPerCm3.toExponential(3)}–${old[k]!.highPerCm3.toExponential(3)})`));

const target = { value: three.score.value, current: three.score.current };
const mc = timed(() => estimateYield(p, three.layout, target, BUDGET, 0.05), 3);
const y = mc.result;
console.log(`yield, ${YIELD_SAMPLES} legs at 0.05 decades: ${mc.median.toFixed(0)} ms median (fastest ${mc.fastest.toFixed(0)} ms; ${(mc.median / YIELD_SAMPLES).toFixed(3)} ms a leg), ${(100 * y.meetsBudget).toFixed(1)} % within ${BUDGET} K, ΔT 5/50/95 % ${y.p05.toFixed(2)} / ${y.p50.toFixed(2)} / ${y.p95.toFixed(2)} K`);
for (const s of [0.02, 0.1, 0.15]) console.log(`  at ${s} decades: ${(100 * estimateYield(p, three.layout, target, BUDGET, s).meetsBudget).toFixed(1)} %`);

const t0 = performance.now();
const sheet = buildGrowthSheet(caseJson, { ...optimum.doping!, value: optimum.objective.value, deltaT: optimum.deltaT }, { lengthMm: 1.5, minZoneMm: 0.2, maxZones: 12, lossBudget: BUDGET, measureTemperature: 300 });
console.log(`whole sheet K = 1…${sheet.steps.length} (zoning, joint bands, yields): ${((performance.now() - t0) / 1000).toFixed(2)} s`);
for (const s of sheet.steps) console.log(`  K = ${s.zones}: ΔT ${s.deltaT.toFixed(3)} K, scale ${s.joint.scale.toFixed(3)}, corners ${s.joint.cornersSolved} (one-at-a-time worst ${s.joint.perZoneWorstCornerLoss.toFixed(2)} K → ${s.joint.worstCornerLoss.toFixed(3)} K), yield ${(100 * s.yield.meetsBudget).toFixed(1)} %`);
