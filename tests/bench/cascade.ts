/**
 * `npm run bench`, cascade part: optimising the bundled three-stage detector
 * cascade of graded band-model legs (couple counts under a total of 60 and
 * one current per stage, 5 mW on the detector stage), printed, never
 * asserted. The optimisation alone, then the whole `leg cascade` run (curves
 * with 3, 2 and 1 stages included).
 */
import { readFileSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { parseCascadeCase } from '../../shared/engine/cascade-case';
import { optimizeCascade } from '../../shared/engine/optimize-cascade';
import { runCascade } from '../../shared/engine/run-cascade-case';

const file = join(__dirname, '..', '..', 'shared', 'engine', 'examples', 'detector-cascade.json');
const c = parseCascadeCase(JSON.parse(readFileSync(file, 'utf8')));
const cpu = () => process.cpuUsage().user / 1e6;

console.log(`\n== cascade: 3 graded stages, counts (total 60) and 3 currents, separate wiring — ${cpus().length} cores, load ${loadavg()[0].toFixed(1)}`);
let t = performance.now();
let u = cpu();
const o = optimizeCascade(c);
console.log(`optimisation: ${((performance.now() - t) / 1000).toFixed(2)} s wall, ${(cpu() - u).toFixed(2)} s CPU, ${o.evaluations} leg solves`);
console.log(`  ΔT ${(c.hotSide - o.point.coldSide).toFixed(4)} K at ${c.heatLoad} W; counts ${o.counts.join(' / ')}; currents ${o.currents.map((v) => v.toFixed(4)).join(' / ')} A; power ${o.point.power.toFixed(4)} W`);
t = performance.now();
u = cpu();
const r = runCascade(c);
console.log(`whole leg cascade run (with ${r.curves.length} curves of ${c.curvePoints} points): ${r.seconds.toFixed(2)} s wall, ${(cpu() - u).toFixed(2)} s CPU, ${r.evaluations} leg solves`);
console.log(`  lowest cold side with no load: ${r.curves.map((k) => `${k.stages} stage${k.stages === 1 ? '' : 's'} ${k.points[0]?.coldSide.toFixed(2)} K`).join(', ')}`);
