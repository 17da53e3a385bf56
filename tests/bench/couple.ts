/**
 * `npm run bench`, matched couples: optimising a couple of graded legs of
 * the demo lab's two band-model families (NL-P7-like p, NL-N3-like n,
 * minority bands included) — both 6-node doping profiles, the area ratio
 * (total 2 mm² of legs) and the current, largest ΔT at no load, Th = 300 K.
 * Printed, never asserted: wall and CPU seconds, leg solves, iterations,
 * the optimum and the mismatch of the shared current.
 */
import { cpus, loadavg } from 'node:os';
import { demoFamilies } from '../../server/db/seed/demo-data';
import { parseCoupleCase } from '../../shared/engine/couple-case';
import { runCouple, type CoupleResult } from '../../shared/engine/run-couple-case';

const say = (line: string) => process.stdout.write(`${line}\n`);
const families = demoFamilies();
const material = (name: string) => {
  const f = families.find((d) => d.name.startsWith(name));
  if (!f) throw new Error(`no demo family ${name}`);
  return f.definition;
};
const leg = (name: string) => ({ length: 1.2e-3, area: 1e-6, material: material(name), bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 }, controlPoints: 6 });
const c = parseCoupleCase({ hotSide: 300, p: leg('NL-P7'), n: leg('NL-N3') });

const RUNS = 3;
say(`Frostgrade matched-couple benchmark — node ${process.version}, load average ${loadavg().map((l) => l.toFixed(2)).join(' ')} on ${cpus().length} cores`);
const wall: number[] = [];
const cpu: number[] = [];
let result: CoupleResult | undefined;
let iterations = 0;
for (let k = 0; k < RUNS; k++) {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  result = runCouple(c, { onProgress: (p) => { iterations = p.iteration; } });
  wall.push((performance.now() - t0) / 1000);
  const used = process.cpuUsage(c0);
  cpu.push((used.user + used.system) / 1e6);
}
const r = result as CoupleResult;
const median = (v: number[]) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)];
const e = (v: number) => v.toExponential(3);
say(`couple of graded demo legs (6 + 6 nodes, ratio, current): ${median(wall).toFixed(2)} s median wall (fastest ${Math.min(...wall).toFixed(2)} s), ${median(cpu).toFixed(2)} s CPU, ${r.evaluations} leg solves, ${iterations} quasi-Newton iterations`);
say(`  ΔT ${r.deltaT.toFixed(4)} K at ${r.current.toFixed(4)} A, A_n/A_p ${r.areaRatio.toFixed(4)} (A_p ${e(r.p.area)} m², A_n ${e(r.n.area)} m²), V ${r.voltage.toFixed(5)} V`);
say(`  p nodes ${r.p.doping?.perCm3.map(e).join(' ')} cm⁻³; J ${e(r.p.currentDensity)} A/m², own ${e(r.p.ownCurrentDensity)} A/m²`);
say(`  n nodes ${r.n.doping?.perCm3.map(e).join(' ')} cm⁻³; J ${e(r.n.currentDensity)} A/m², own ${e(r.n.ownCurrentDensity)} A/m²`);
say(`  legs powered separately: ΔT ${r.mismatch.separateObjective.toFixed(4)} K; sharing one current costs ${r.mismatch.cost.toFixed(4)} K`);
