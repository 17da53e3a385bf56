import { CaseError } from './case-error';
import { parseCoupleCase } from './couple-case';
import { runCouple } from './run-couple-case';

/**
 * A matched couple of constant-property legs against the closed forms.
 * Sources: A. F. Ioffe, Semiconductor Thermoelements and Thermoelectric
 * Cooling (1957); H. J. Goldsmid, Introduction to Thermoelectricity
 * (Springer, 2010), the chapter on thermocouple optimisation — from memory.
 * A couple is one leg with α = S_p − S_n, R = ρ_p·L/A_p + ρ_n·L/A_n,
 * K = κ_p·A_p/L + κ_n·A_n/L and Z = α²/(R·K); R·K is least at
 * A_n/A_p = √(ρ_n·κ_p/(ρ_p·κ_n)), where Z = α²/(√(ρ_p·κ_p) + √(ρ_n·κ_n))².
 */
const TH = 300;
const L = 1e-3;
const AREA = 1e-6;
type Props = { seebeck: number; sigma: number; kappa: number };

// Legs of different Z (as in module.test.ts) …
const P1: Props = { seebeck: 210e-6, sigma: 1.1e5, kappa: 1.45 };
const N1: Props = { seebeck: -190e-6, sigma: 0.95e5, kappa: 1.6 };
// … and of equal Z = S²σ/κ = 2.667e-3 /K but different S, ρ, κ (matched ratio 0.741, not 1).
const P2: Props = { seebeck: 200e-6, sigma: 1e5, kappa: 1.5 };
const N2: Props = { seebeck: -180e-6, sigma: 1.5e5, kappa: (180e-6 * 180e-6 * 1.5e5) / ((200e-6 * 200e-6 * 1e5) / 1.5) };

const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const leg = (props: Props, area?: number) => ({ length: L, ...(area !== undefined ? { area } : {}), segments: [{ fraction: 1, ...props }] });

function couple(p: Props, n: Props, ratio: number, pArea = AREA) {
  const rho = (x: Props) => 1 / x.sigma;
  const alpha = p.seebeck - n.seebeck;
  const r = (rho(p) * L) / pArea + (rho(n) * L) / (ratio * pArea);
  const k = (p.kappa * pArea) / L + (n.kappa * ratio * pArea) / L;
  return { alpha, r, k, z: (alpha * alpha) / (r * k) };
}
const matchedRatio = (p: Props, n: Props) => Math.sqrt((p.kappa / n.sigma) / (n.kappa / p.sigma));
const coldOf = (z: number) => (Math.sqrt(1 + 2 * z * TH) - 1) / z;
const deltaTMax = (z: number) => 0.5 * z * coldOf(z) ** 2;

describe('matched couple of constant legs against Ioffe’s closed forms', () => {
  test.each([
    ['different Z', P1, N1],
    ['equal Z', P2, N2],
  ])('(a) %s: the optimum ratio is √(ρn·κp/(ρp·κn)) and ΔTmax = ½·Z·Tc² with the matched Z', (_name, p, n) => {
    // The total p.area + n.area = 2e-6 m² is split by the optimiser.
    const r = runCouple(parseCoupleCase({ hotSide: TH, p: leg(p, AREA), n: leg(n, AREA) }));
    const rStar = matchedRatio(p, n);
    const z = (p.seebeck - n.seebeck) ** 2 / (Math.sqrt(p.kappa / p.sigma) + Math.sqrt(n.kappa / n.sigma)) ** 2;
    expect(relative(r.deltaT, deltaTMax(z))).toBeLessThan(1e-6);
    expect(relative(r.coldSide, coldOf(z))).toBeLessThan(1e-6);
    // ΔT is flat (quadratic) at the optimum ratio: a 1e-12 error in ΔT allows ~1e-6 in the ratio.
    expect(relative(r.areaRatio, rStar)).toBeLessThan(1e-4);
    expect(r.p.area + r.n.area).toBeCloseTo(2 * AREA, 18);
    // Current of the largest ΔT: α·Tc/R (Ioffe).
    const { alpha, r: resistance } = couple(p, n, r.areaRatio, r.p.area);
    expect(relative(r.current, (alpha * r.coldSide) / resistance)).toBeLessThan(1e-4);
  });

  test('(b) equal-Z legs at the matched ratio run at their own best current densities and lose nothing to the shared current', () => {
    const rStar = matchedRatio(P2, N2);
    const r = runCouple(parseCoupleCase({ hotSide: TH, p: leg(P2, AREA), n: leg(N2), areaRatio: rStar }));
    // At zero load each leg alone is best at J = S·Tc/(ρ·L), with the couple's Tc since its Z is the legs' Z.
    expect(relative(r.p.ownCurrentDensity, r.p.currentDensity)).toBeLessThan(1e-4);
    expect(relative(r.n.ownCurrentDensity, r.n.currentDensity)).toBeLessThan(1e-4);
    expect(relative(r.p.ownCurrentDensity, (P2.seebeck * r.coldSide * P2.sigma) / L)).toBeLessThan(1e-4);
    expect(r.mismatch.unit).toBe('K');
    expect(r.mismatch.cost).toBeLessThan(1e-6);
  });

  test('(b) a ratio 3× off the matched one costs what the closed forms say', () => {
    const ratio = 3 * matchedRatio(P2, N2);
    const r = runCouple(parseCoupleCase({ hotSide: TH, p: leg(P2, AREA), n: leg(N2), areaRatio: ratio }));
    const shared = couple(P2, N2, ratio);
    expect(relative(r.deltaT, deltaTMax(shared.z))).toBeLessThan(1e-6);
    // Powered separately each leg runs at its own maximum-Qc current S·Tc/R_k, so
    // Σ S_k²Tc²/(2R_k) = K·ΔT: the couple behaves as Z_sep = (S_p²/R_p + S_n²/R_n)/(K_p + K_n) — derived from Ioffe's leg forms.
    const rp = L / (P2.sigma * AREA);
    const rn = L / (N2.sigma * ratio * AREA);
    const zSeparate = (P2.seebeck ** 2 / rp + N2.seebeck ** 2 / rn) / shared.k;
    const cost = deltaTMax(zSeparate) - deltaTMax(shared.z);
    expect(cost).toBeGreaterThan(0.5);
    expect(Math.abs(r.mismatch.cost - cost)).toBeLessThan(1e-6 * deltaTMax(zSeparate));
    expect(relative(r.mismatch.separateObjective, deltaTMax(zSeparate))).toBeLessThan(1e-8);
    // Off the matched ratio the legs want different current densities from the one they share.
    expect(relative(r.n.ownCurrentDensity, r.n.currentDensity)).toBeGreaterThan(0.1);
  });

  test('(c) maxHeatLoad at a fixed ratio: I = α·Tc/R and Qc = α²Tc²/(2R) − K·ΔT; the mismatch is in watts', () => {
    const tc = 260;
    const r = runCouple(parseCoupleCase({ hotSide: TH, coldSide: tc, objective: 'maxHeatLoad', p: leg(P1, AREA), n: leg(N1), areaRatio: 1.3 }));
    const { alpha, r: resistance, k } = couple(P1, N1, 1.3);
    expect(relative(r.current, (alpha * tc) / resistance)).toBeLessThan(1e-5);
    expect(relative(r.heatLoad, (alpha * alpha * tc * tc) / (2 * resistance) - k * (TH - tc))).toBeLessThan(1e-9);
    expect(r.objective).toEqual({ kind: 'maxHeatLoad', value: r.heatLoad });
    // Separately: Σ S_k²Tc²/(2R_k) − K·ΔT (each leg at its own maximum-Qc current).
    const rp = L / (P1.sigma * AREA);
    const rn = L / (N1.sigma * 1.3 * AREA);
    const separate = (P1.seebeck ** 2 * tc * tc) / (2 * rp) + (N1.seebeck ** 2 * tc * tc) / (2 * rn) - k * (TH - tc);
    expect(r.mismatch.unit).toBe('W');
    expect(relative(r.mismatch.separateObjective, separate)).toBeLessThan(1e-8);
    expect(relative(r.p.ownCurrentDensity, (P1.seebeck * tc * P1.sigma) / L)).toBeLessThan(1e-5);
  });

  test('(c) maxCop at a fixed ratio: the heat load of the best-COP current gives that current and COPmax = (Tc/ΔT)(M − Th/Tc)/(M + 1)', () => {
    const tc = 270;
    const dT = TH - tc;
    const { alpha, r: resistance, k, z } = couple(P1, N1, 1.3);
    const m = Math.sqrt(1 + z * 0.5 * (tc + TH));
    const iCop = (alpha * dT) / (resistance * (m - 1));
    const heatLoad = alpha * iCop * tc - k * dT - 0.5 * iCop * iCop * resistance;
    const r = runCouple(parseCoupleCase({ hotSide: TH, coldSide: tc, heatLoad, objective: 'maxCop', p: leg(P1, AREA), n: leg(N1), areaRatio: 1.3 }));
    expect(relative(r.current, iCop)).toBeLessThan(1e-8);
    expect(relative(r.cop ?? NaN, (tc * (m - TH / tc)) / (dT * (m + 1)))).toBeLessThan(1e-8);
    expect(r.mismatch.unit).toBe('');
    expect(r.mismatch.separateObjective).toBeGreaterThanOrEqual(r.cop ?? NaN);
    // Freeing the ratio (same total area) can only help.
    const free = runCouple(parseCoupleCase({ hotSide: TH, coldSide: tc, heatLoad, objective: 'maxCop', p: leg(P1, AREA), n: leg(N1, 1.3 * AREA) }));
    expect(free.cop ?? NaN).toBeGreaterThanOrEqual((r.cop ?? NaN) - 1e-9);
  });

  test('maxCop with a heat load above the couple’s largest Qc at that Tc is refused on heatLoad', () => {
    const tc = 270;
    const { alpha, r: resistance, k } = couple(P1, N1, 1.3);
    const most = (alpha * alpha * tc * tc) / (2 * resistance) - k * (TH - tc);
    const run = () => runCouple(parseCoupleCase({ hotSide: TH, coldSide: tc, heatLoad: 1.01 * most, objective: 'maxCop', p: leg(P1, AREA), n: leg(N1), areaRatio: 1.3 }));
    expect(run).toThrow(CaseError);
    expect(run).toThrow(/^heatLoad: /);
  });

  test('with nothing free the couple is just evaluated: Ioffe’s Tc at the given current', () => {
    const r = runCouple(parseCoupleCase({ hotSide: TH, p: leg(P1, AREA), n: leg(N1), areaRatio: 1.3, current: 4 }));
    const { alpha, r: resistance, k } = couple(P1, N1, 1.3);
    // Qc = 0: Tc = (½I²R + K·Th)/(α·I + K).
    expect(relative(r.coldSide, (0.5 * 16 * resistance + k * TH) / (alpha * 4 + k))).toBeLessThan(1e-9);
    expect(r.current).toBe(4);
    expect(r.power).toBeCloseTo(r.voltage * r.current, 12);
  });
});
