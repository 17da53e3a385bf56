import { cascadeAt, cascadeSolver, type CascadeDefinition, type CascadeStage } from './cascade';
import { parseCascadeCase } from './cascade-case';
import { CaseError } from './case-error';
import { deviceSolver } from './device';
import { legFromDefinition, type LegDefinition } from './module';
import { optimizeCascade } from './optimize-cascade';
import { runCascade } from './run-cascade-case';

const TH = 300;
const L = 1e-3;
const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

// Constant-property p and n legs, as in module.test.ts.
const P = { seebeck: 210e-6, sigma: 1.1e5, kappa: 1.45 };
const N = { seebeck: -190e-6, sigma: 0.95e5, kappa: 1.6 };
const AP = 1e-6;
const AN = 1.3e-6;
const constantLeg = (props: typeof P, area: number): LegDefinition => ({ length: L, area, leg: { kind: 'segments', segments: [{ fraction: 1, ...props }] } });
const constantStage = (couples: number, interfaceResistance: number): CascadeStage => ({ couples, p: constantLeg(P, AP), n: constantLeg(N, AN), interfaceResistance });
/** One couple's S, R, K (Ioffe 1957; Goldsmid, Introduction to Thermoelectricity, Springer 2010 — from memory). */
const S = P.seebeck - N.seebeck;
const R = L / (P.sigma * AP) + L / (N.sigma * AN);
const K = (P.kappa * AP) / L + (N.kappa * AN) / L;
const Z = (S * S) / (R * K);

// Band-model legs of the demo families' kind (server/db/seed/demo-data.ts), graded p, contacts.
const bandP = { kind: 'band', carrier: 'p', effectiveMass: 1.0, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1.0, latticeKappaExponent: -1 };
const bandN = { kind: 'band', carrier: 'n', effectiveMass: 1.1, mobility300: 300, mobilityExponent: -1.5, latticeKappa300: 1.3, latticeKappaExponent: -1 };
const bandStageJson = (couples: number, interfaceResistance: number) => ({
  couples,
  p: { length: 1.2e-3, area: 5e-7, material: bandP, doping: { x: [0, 0.5, 1], perCm3: [3e19, 1.8e19, 8e18] }, contactResistivity: 5e-10 },
  n: { length: 1.2e-3, area: 6e-7, material: bandN, doping: 2e19, contactResistivity: 5e-10 },
  interfaceResistance,
});
const bandCase = (extra: Record<string, unknown> = {}) =>
  parseCascadeCase({ hotSide: TH, heatLoad: 0.005, wiring: 'separate', currents: [1.4, 1.8, 2.3], stages: [bandStageJson(3, 0.3), bandStageJson(10, 0.1), bandStageJson(36, 0.03)], ...extra });

describe('a cascade of constant-property stages against closed forms', () => {
  test('each stage obeys Qc = N[S·I·Tc − ½I²R − K·ΔT], Qh = N[S·I·Th − K·ΔT + ½I²R]; Tc from the hand-marched linear cascade to 1e-9', () => {
    // Ioffe 1957 / Goldsmid 2010 (from memory): with constant properties each
    // stage's heats are linear in its junction temperatures, so the whole
    // cascade at fixed currents and load is linear in Tc: march it up from Tc
    // and solve Th_last − R_last·Qh_last = hotSide for Tc.
    const counts = [3, 9, 30];
    const resistances = [0.4, 0.15, 0.05];
    const currents = [2.1, 2.8, 3.3];
    const Q = 0.02;
    const march = (tc: number) => {
      let t = tc;
      let load = Q;
      const stages: { tc: number; th: number; qc: number; qh: number }[] = [];
      for (let k = 0; k < 3; k++) {
        const n = counts[k];
        const I = currents[k];
        // Qc = n(S·I·t − ½I²R − K(th − t)) = load → th
        const th = (n * (S * I * t - 0.5 * I * I * R + K * t) - load) / (n * K);
        const qh = n * (S * I * th - K * (th - t) + 0.5 * I * I * R);
        stages.push({ tc: t, th, qc: load, qh });
        t = th - resistances[k] * qh;
        load = qh;
      }
      return { stages, sink: t };
    };
    const f0 = march(0).sink - TH;
    const f1 = march(1).sink - TH;
    const tc = -f0 / (f1 - f0);
    const hand = march(tc);
    const def: CascadeDefinition = { stages: counts.map((n, k) => constantStage(n, resistances[k])) };
    const p = cascadeAt(def, currents, TH, { heatLoad: Q });
    expect(p).toBeDefined();
    if (!p) return;
    expect(relative(p.coldSide, tc)).toBeLessThan(1e-9);
    p.stages.forEach((s, k) => {
      expect(relative(s.coldSide, hand.stages[k].tc)).toBeLessThan(1e-9);
      expect(relative(s.hotSide, hand.stages[k].th)).toBeLessThan(1e-9);
      expect(relative(s.heatRejected, hand.stages[k].qh)).toBeLessThan(1e-9);
      // Closed forms at the solved junction temperatures.
      const n = counts[k];
      const I = currents[k];
      const dT = s.hotSide - s.coldSide;
      expect(relative(s.heatLoad, n * (S * I * s.coldSide - 0.5 * I * I * R - K * dT))).toBeLessThan(1e-9);
      expect(relative(s.heatRejected, n * (S * I * s.hotSide - K * dT + 0.5 * I * I * R))).toBeLessThan(1e-9);
      // P = N(S·ΔT·I + I²R)
      expect(relative(s.power, n * (S * dT * I + I * I * R))).toBeLessThan(1e-9);
    });
  });

  test('optimised single stage: the current of largest ΔT is S·Tc/R and ΔTmax = Z·Tc²/2 (Ioffe 1957, closed form)', () => {
    const c = parseCascadeCase({ hotSide: TH, stages: [{ couples: 5, p: { length: L, area: AP, segments: [{ fraction: 1, ...P }] }, n: { length: L, area: AN, segments: [{ fraction: 1, ...N }] } }] });
    const r = optimizeCascade(c);
    const tc = (Math.sqrt(1 + 2 * Z * TH) - 1) / Z;
    expect(relative(r.point.coldSide, tc)).toBeLessThan(1e-9);
    expect(TH - r.point.coldSide).toBeCloseTo((Z * tc * tc) / 2, 6);
    expect(relative(r.currents[0], (S * tc) / R)).toBeLessThan(1e-3);
  });
});

describe('cascade identities', () => {
  test('1/COP = Π(1 + 1/COP_k) − 1: heat is conserved through the interfaces (band-model graded legs, contacts)', () => {
    // Each stage's rejected heat is the next one's load, so Q_h,last = Q·Π(1 + 1/COP_k)
    // and the cascade's COP follows (Goldsmid 2010, multistage coolers — from memory).
    const c = bandCase();
    const p = cascadeAt({ stages: c.stages }, [1.4, 1.8, 2.3], TH, { heatLoad: 0.005 });
    expect(p).toBeDefined();
    if (!p || p.cop === null) throw new Error('no point');
    const product = p.stages.reduce((s, st) => s * (1 + st.power / st.heatLoad), 1);
    expect(relative(1 / p.cop, product - 1)).toBeLessThan(1e-8);
    for (let k = 0; k + 1 < 3; k++) expect(relative(p.stages[k + 1].heatLoad, p.stages[k].heatRejected)).toBeLessThan(1e-9);
  });

  test('a one-stage cascade equals the module (deviceSolver) at the same current, sink and load, to 1e-9', () => {
    const c = parseCascadeCase({ hotSide: TH, heatLoad: 0.05, stages: [bandStageJson(12, 0.07)] });
    const st = c.stages[0];
    const module = deviceSolver({ legs: [{ leg: legFromDefinition(st.p), count: 12 }, { leg: legFromDefinition(st.n), count: 12 }], coldPlateResistance: 0, hotPlateResistance: 0.07 }, 1e-9).at(2.2, TH, { heatLoad: 0.05 });
    const cascade = cascadeAt({ stages: c.stages }, 2.2, TH, { heatLoad: 0.05 });
    if (!module || !cascade) throw new Error('no point');
    expect(relative(cascade.coldSide, module.coldSide)).toBeLessThan(1e-9);
    expect(relative(cascade.stages[0].hotSide, module.hotJunction)).toBeLessThan(1e-9);
    expect(relative(cascade.stages[0].voltage, module.voltage)).toBeLessThan(1e-9);
    expect(relative(cascade.stages[0].heatRejected, module.heatRejected)).toBeLessThan(1e-9);
  });

  test('series wiring equals separate wiring when the currents are equal', () => {
    const stages = [bandStageJson(3, 0.3), bandStageJson(10, 0.1)];
    const series = runCascade(parseCascadeCase({ hotSide: TH, heatLoad: 0.01, wiring: 'series', current: 1.9, stages, curvePoints: 2 }));
    const separate = runCascade(parseCascadeCase({ hotSide: TH, heatLoad: 0.01, wiring: 'separate', currents: [1.9, 1.9], stages, curvePoints: 2 }));
    expect(relative(series.coldSide, separate.coldSide)).toBeLessThan(1e-12);
    expect(relative(series.power, separate.power)).toBeLessThan(1e-12);
    series.stages.forEach((s, k) => expect(relative(s.voltage, separate.stages[k].voltage)).toBeLessThan(1e-12));
  });

  test('more stages never lower the best ΔT at zero load (optimised currents, a pyramid of 1 : 5 : 25 couples)', () => {
    const all = [bandStageJson(1, 0.2), bandStageJson(5, 0.05), bandStageJson(25, 0.01)];
    const best = [1, 2, 3].map((m) => optimizeCascade(parseCascadeCase({ hotSide: TH, wiring: 'separate', stages: all.slice(3 - m) })).point);
    expect(TH - best[1].coldSide).toBeGreaterThan(TH - best[0].coldSide);
    expect(TH - best[2].coldSide).toBeGreaterThan(TH - best[1].coldSide);
  });
});

describe('the cascade optimiser', () => {
  test('a 2-stage optimum beats every point of a coarse grid over the two currents (independent brute force)', () => {
    const c = parseCascadeCase({ hotSide: TH, heatLoad: 0.005, wiring: 'separate', stages: [bandStageJson(3, 0.2), bandStageJson(12, 0.05)] });
    const r = optimizeCascade(c);
    let gridBest = -Infinity;
    const grid = cascadeSolver({ stages: c.stages }, 1e-9);
    for (let i = 1; i <= 10; i++) {
      for (let j = 1; j <= 10; j++) {
        const p = grid.at([0.35 * i, 0.4 * j], TH, { heatLoad: 0.005 });
        if (p) gridBest = Math.max(gridBest, TH - p.coldSide);
      }
    }
    expect(gridBest).toBeGreaterThan(0);
    expect(TH - r.point.coldSide).toBeGreaterThanOrEqual(gridBest - 1e-9);
  });

  test('couple counts with a total: whole numbers ≥ 1 adding up to the total, no worse than the given split', () => {
    const stages = [bandStageJson(5, 0.2), bandStageJson(5, 0.05)];
    const given = optimizeCascade(parseCascadeCase({ hotSide: TH, heatLoad: 0.005, wiring: 'separate', stages }));
    const r = optimizeCascade(parseCascadeCase({ hotSide: TH, heatLoad: 0.005, wiring: 'separate', stages, optimizeCouples: { total: 10 } }));
    expect(r.counts.reduce((s, v) => s + v, 0)).toBe(10);
    r.counts.forEach((v) => expect(Number.isInteger(v) && v >= 1).toBe(true));
    expect(r.point.coldSide).toBeLessThanOrEqual(given.point.coldSide + 1e-9);
  });

  test('minPower holds exactly the load at the cold side, with no more power than the max-ΔT currents spend there', () => {
    const stages = [bandStageJson(3, 0.2), bandStageJson(12, 0.05)];
    const r = optimizeCascade(parseCascadeCase({ hotSide: TH, objective: 'minPower', coldSide: 230, heatLoad: 0.02, wiring: 'separate', stages }));
    expect(r.point.coldSide).toBe(230);
    expect(relative(r.point.heatLoad, 0.02)).toBeLessThan(1e-8);
    const c = parseCascadeCase({ hotSide: TH, heatLoad: 0.02, wiring: 'separate', stages });
    const atMax = cascadeAt({ stages: c.stages }, optimizeCascade(c).currents, TH, { coldSide: 230 });
    expect(atMax && atMax.heatLoad >= 0.02).toBe(true);
    expect(r.point.power).toBeLessThan(atMax?.power ?? 0);
  });

  test('minPower at a load the cascade cannot hold is a CaseError on coldSide that says so', () => {
    const c = parseCascadeCase({ hotSide: TH, objective: 'minPower', coldSide: 150, heatLoad: 0.02, wiring: 'separate', stages: [bandStageJson(3, 0.2), bandStageJson(12, 0.05)] });
    expect(() => optimizeCascade(c)).toThrow(/^coldSide: the cascade cannot hold 0\.02 W at 150 K with its couples/);
  });
});

describe('cascade cases', () => {
  const stage = bandStageJson(3, 0.1);
  const fieldOf = (json: unknown) => {
    try {
      parseCascadeCase(json);
    } catch (e) {
      if (e instanceof CaseError) return e.field;
      throw e;
    }
    return null;
  };
  test.each<[string, unknown, string]>([
    ['a stage with zero couples', { hotSide: TH, stages: [stage, { ...stage, couples: 0 }] }, 'stages[1].couples'],
    ['no stages', { hotSide: TH, stages: [] }, 'stages'],
    ['five stages', { hotSide: TH, stages: [stage, stage, stage, stage, stage] }, 'stages'],
    ['a p leg that is n-type', { hotSide: TH, stages: [{ ...stage, p: stage.n }] }, 'stages[0].p.material'],
    ['wrong number of currents', { hotSide: TH, wiring: 'separate', currents: [1], stages: [stage, stage] }, 'currents'],
    ['currents with series wiring', { hotSide: TH, currents: [1, 1], stages: [stage, stage] }, 'currents'],
    ['minPower without coldSide', { hotSide: TH, objective: 'minPower', heatLoad: 0.01, stages: [stage] }, 'coldSide'],
    ['minPower with every current fixed', { hotSide: TH, objective: 'minPower', coldSide: 250, heatLoad: 0.01, current: 2, stages: [stage] }, 'current'],
    ['a total below one couple per stage', { hotSide: TH, optimizeCouples: { total: 1 }, stages: [stage, stage] }, 'optimizeCouples.total'],
    ['doping in m⁻³', { hotSide: TH, stages: [stage, { ...stage, n: { ...stage.n, doping: 2e25 } }] }, 'stages[1].n.doping'],
  ])('%s is refused naming the field', (_name, json, field) => {
    expect(fieldOf(json)).toBe(field);
  });

  test('the zero-couple message says why in words', () => {
    expect(() => parseCascadeCase({ hotSide: TH, stages: [{ ...stage, couples: 0 }] })).toThrow(/^stages\[0\]\.couples: a stage needs at least 1 couple/);
  });
});
