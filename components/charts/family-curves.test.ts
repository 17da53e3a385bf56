import { figureOfMerit, propertiesAt } from '@/shared/engine';
import { bestMeasuredVsTemperature, curveVsDoping, logSpaced, measuredVsDoping, optimumVsTemperature, plotSetup, type TableRow } from './family-curves';

const band = {
  kind: 'band',
  carrier: 'n',
  effectiveMass: 1.0,
  mobility300: 300,
  mobilityExponent: -1.5,
  latticeKappa300: 1.2,
  latticeKappaExponent: -1,
} as const;

/** Invented 3 × 2 grid: S falls with doping, σ rises with it. */
const rows: TableRow[] = [1e19, 2e19, 4e19].flatMap((n, i) =>
  [300, 350].map((t) => ({ perCm3: n, temperature: t, seebeck: (220 - 40 * i + (t - 300) / 5) * 1e-6, sigma: 6e4 * (i + 1), kappa: 1.4 + 0.2 * i })),
);

describe('family curves', () => {
  it('spaces dopings evenly in log10 between the ends', () => {
    const n = logSpaced(1e17, 1e21, 5);
    expect(n.map((v) => Math.log10(v))).toEqual([17, 18, 19, 20, 21].map((k) => expect.closeTo(k, 12)));
    expect(logSpaced(1e19, 1e19)).toEqual([1e19]);
  });

  it('draws the band model in trade units, with the carrier’s sign', () => {
    const setup = plotSetup(band);
    if (!setup.ok || !setup.family) throw new Error('band model should plot');
    const seebeck = curveVsDoping(setup.family, 'seebeck', 300, setup.dopingRange);
    expect(seebeck).toHaveLength(41);
    expect(seebeck[0].x).toBeCloseTo(1e17, -12);
    // n-type: S < 0, and |S| falls as doping rises.
    expect(seebeck.every((p) => p.y < 0)).toBe(true);
    expect(Math.abs(seebeck[40].y)).toBeLessThan(Math.abs(seebeck[0].y));
    const direct = propertiesAt(setup.family, seebeck[20].x, 300);
    expect(seebeck[20].y).toBeCloseTo(direct.seebeck * 1e6, 9);
    const sigma = curveVsDoping(setup.family, 'sigma', 300, setup.dopingRange);
    expect(sigma[20].y).toBeCloseTo(direct.sigma / 100, 6);
  });

  it('finds the zT-optimal doping where zT is largest on the plotted curve', () => {
    const setup = plotSetup(band);
    if (!setup.ok || !setup.family) throw new Error('band model should plot');
    const [at300] = optimumVsTemperature(setup.family, { low: 300, high: 300 }, setup.dopingRange);
    const zT = curveVsDoping(setup.family, 'zT', 300, setup.dopingRange);
    const best = zT.reduce((a, b) => (b.y > a.y ? b : a));
    // The curve's best point is within one grid step (0.1 decade) of the optimum.
    expect(Math.abs(Math.log10(at300.y) - Math.log10(best.x))).toBeLessThan(0.1);
    expect(propertiesAt(setup.family, at300.y, 300).zT).toBeGreaterThanOrEqual(best.y - 1e-9);
  });

  it('plots a measured table as its own points plus the interpolation through them', () => {
    const setup = plotSetup({ kind: 'table', rows });
    if (!setup.ok || !setup.family) throw new Error('full grid should interpolate');
    expect(setup.temperatureChoices).toEqual([300, 350]);
    expect(setup.dopingRange).toEqual({ min: 1e19, max: 4e19 });
    const points = measuredVsDoping(rows, 'zT', 350);
    expect(points.map((p) => p.x)).toEqual([1e19, 2e19, 4e19]);
    expect(points[1].y).toBeCloseTo(figureOfMerit(rows[3], 350), 12);
    // The interpolation passes through the measured points.
    const line = curveVsDoping(setup.family, 'seebeck', 350, setup.dopingRange);
    expect(line[0].y).toBeCloseTo(rows[1].seebeck * 1e6, 6);
    expect(line[line.length - 1].y).toBeCloseTo(rows[5].seebeck * 1e6, 6);
  });

  it('marks the best measured doping at each measured temperature', () => {
    // zT = S²σT/κ at 300 K: 0.622, 0.729, 0.588 for 1, 2, 4 × 10¹⁹ cm⁻³; at 350 K: 0.793, 0.948, 0.787.
    expect(bestMeasuredVsTemperature(rows)).toEqual([
      { x: 300, y: 2e19 },
      { x: 350, y: 2e19 },
    ]);
  });

  it('keeps the points of a table with a hole and says why there are no lines', () => {
    const setup = plotSetup({ kind: 'table', rows: rows.slice(0, 5) });
    expect(setup.ok && setup.family).toBe(null);
    if (!setup.ok) throw new Error('points should still plot');
    expect(setup.linesMissing).toMatch(/^Measured points only, no interpolation: no row at perCm3 = 4e\+19 and temperature = 350 K/);
  });

  it('has nothing to plot for constant properties', () => {
    const setup = plotSetup({ kind: 'constant', seebeck: 2e-4, sigma: 1e5, kappa: 1.5 });
    expect(setup).toEqual({ ok: false, reason: expect.stringMatching(/do not change with doping or temperature/) });
  });
});
