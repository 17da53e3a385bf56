import { familyFromMaterial, optimizeLeg, parseCase, propertiesAt } from '../engine';
import { hallCorrection } from '../engine/hall-factor';
import { buildGrowthSheet } from './growth-sheet';
import { reportMeasurements } from './measurement-report';
import { parseMeasurementsCsv } from './parse-measurements';

/** The demo p-type band family (typical values, from memory) on an invented 1.5 mm leg; grower's minimum zone 0.2 mm. */
const material = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } as const;
const caseJson = { hotSide: 300, length: 1.5e-3, area: 1e-6, material, bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 }, controlPoints: 8 };
const run = optimizeLeg(parseCase(caseJson, 'optimize'));
const sheet = buildGrowthSheet(caseJson, { ...run.doping!, value: run.objective.value, deltaT: run.deltaT }, { lengthMm: 1.5, minZoneMm: 0.2, maxZones: 4, lossBudget: 1, measureTemperature: 300 });

describe('growth sheet', () => {
  it('lists K = 1…4 with ΔT rising towards the continuous profile, zones in mm from the cold end', () => {
    expect(sheet.steps.map((s) => s.zones)).toEqual([1, 2, 3, 4]);
    sheet.steps.forEach((s, i) => {
      if (i > 0) expect(s.deltaT).toBeGreaterThanOrEqual(sheet.steps[i - 1]!.deltaT - 1e-9);
      expect(s.deltaT).toBeLessThanOrEqual(sheet.continuous.deltaT + 1e-6);
      expect(s.rows[0]!.startMm).toBe(0);
      expect(s.rows[s.rows.length - 1]!.endMm).toBeCloseTo(1.5, 9);
      for (const r of s.rows) expect(r.endMm - r.startMm).toBeGreaterThanOrEqual(0.2 - 1e-9);
    });
  });

  it('gives the room-temperature readings the family predicts at the target and across the band', () => {
    const family = familyFromMaterial(material);
    for (const r of sheet.steps[2]!.rows) {
      const at = propertiesAt(family, r.perCm3, 300);
      expect(r.seebeckUvK).toBeCloseTo(at.seebeck * 1e6, 6);
      expect(r.sigmaSCm).toBeCloseTo(at.sigma / 100, 6);
      expect(r.seebeckBandUvK[0]).toBeLessThanOrEqual(r.seebeckUvK);
      expect(r.seebeckBandUvK[1]).toBeGreaterThanOrEqual(r.seebeckUvK);
      expect(r.sigmaBandSCm[0]).toBeLessThanOrEqual(r.sigmaSCm);
    }
  });
});

/** The demo band family sampled on a grid, as a measured-style table (only its lack of a band model matters here). */
function tableMaterial() {
  const family = familyFromMaterial(material);
  const rows = [17.5, 18, 18.5, 19, 19.5, 20, 20.5].flatMap((y) => [150, 200, 250, 300, 350].map((t) => {
    const at = propertiesAt(family, 10 ** y, t);
    return { perCm3: 10 ** y, temperature: t, seebeck: at.seebeck, sigma: at.sigma, kappa: at.kappa };
  }));
  return { kind: 'table' as const, rows };
}

describe('as-grown measurements against the sheet', () => {
  const family = familyFromMaterial(material);
  const step = sheet.steps[2]!;
  /** Room-temperature S and σ every 0.05 mm of a piece grown with the given zone dopings. */
  function csvFor(dopings: number[]): string {
    const lines = ['position_mm,seebeck_uV_per_K,sigma_S_per_cm'];
    for (let mm = 0.025; mm < 1.5; mm += 0.05) {
      const k = step.rows.findIndex((r) => mm >= r.startMm && mm < r.endMm);
      const at = propertiesAt(family, dopings[k]!, 300);
      lines.push(`${mm.toFixed(3)},${(at.seebeck * 1e6).toFixed(3)},${(at.sigma / 100).toFixed(4)}`);
    }
    return lines.join('\n');
  }

  it('a piece grown to target is inferred back, judged within tolerance, and predicted close to the target', () => {
    const parsed = parseMeasurementsCsv(csvFor(step.rows.map((r) => r.perCm3)), 1.5);
    expect(parsed.ok).toBe(true);
    const report = reportMeasurements(caseJson, sheet, 3, parsed.points, 300);
    expect(report.verdicts.map((v) => v.verdict)).toEqual(['within', 'within', 'within']);
    expect(report.points.every((q) => !q.disagree)).toBe(true);
    // Interpolating between points 0.05 mm apart smooths each step a little: within 0.5 K of the zoned target.
    expect(Math.abs(report.asGrown.atDesignCurrent.deltaT - step.deltaT)).toBeLessThan(0.5);
  });

  it('flags a zone grown outside its band, and the predicted ΔT drops', () => {
    const off = step.rows.map((r, k) => (k === 0 ? r.highPerCm3 * 2 : r.perCm3));
    const report = reportMeasurements(caseJson, sheet, 3, parseMeasurementsCsv(csvFor(off), 1.5).points, 300);
    expect(report.verdicts[0]!.verdict).toBe('high');
    expect(report.asGrown.atDesignCurrent.deltaT).toBeLessThan(step.deltaT - 0.5);
  });

  it('judges every reading against its zone\'s band: one stray position flags itself and its zone though the zone\'s mean is on target', () => {
    // The shape of a real upload: S a few per cent above the band's top (312 against 246–304 µV/K)
    // and σ below its bottom (292 against 306–603 S/cm) at one position of a zone otherwise on target.
    const k = 1;
    const zone = step.rows[k]!;
    const at = zone.startMm + 0.75 * (zone.endMm - zone.startMm);
    const stray = { seebeck: zone.seebeckBandUvK[1] * (312 / 304), sigma: zone.sigmaBandSCm[0] * (292 / 306) };
    const lines = csvFor(step.rows.map((r) => r.perCm3)).split('\n');
    lines.push(`${at.toFixed(3)},${stray.seebeck.toFixed(3)},${stray.sigma.toFixed(4)}`);
    const parsed = parseMeasurementsCsv(lines.join('\n'), 1.5);
    const report = reportMeasurements(caseJson, sheet, 3, parsed.points, 300);
    const flagged = report.points.filter((q) => q.readings.some((r) => r.verdict !== 'within'));
    expect(flagged.map((q) => q.positionMm)).toEqual([Number(at.toFixed(3))]);
    expect(flagged[0]!.zone).toBe(k);
    // Judged at the sheet's check temperature, the bands are the ones the sheet prints.
    expect(flagged[0]!.readings).toEqual([
      { kind: 'seebeck', value: expect.closeTo(stray.seebeck, 3), low: expect.closeTo(zone.seebeckBandUvK[0], 9), high: expect.closeTo(zone.seebeckBandUvK[1], 9), verdict: 'high' },
      { kind: 'sigma', value: expect.closeTo(stray.sigma, 4), low: expect.closeTo(zone.sigmaBandSCm[0], 9), high: expect.closeTo(zone.sigmaBandSCm[1], 9), verdict: 'low' },
    ]);
    const inZone = report.points.filter((q) => q.zone === k);
    expect(report.verdicts[k]).toMatchObject({ verdict: 'stray', points: inZone.length, readings: 2 * inZone.length, readingsOutside: 2 });
    // The zone's mean doping alone would have read within: the stray point is one of several.
    expect(report.verdicts[k]!.measured!).toBeGreaterThan(zone.lowPerCm3);
    expect(report.verdicts.filter((_, i) => i !== k).map((v) => v.verdict)).toEqual(['within', 'within']);
  });

  it('reads a position measured at another temperature against the band at that temperature', () => {
    const zone = step.rows[0]!;
    const at350 = propertiesAt(family, zone.perCm3, 350);
    const parsed = parseMeasurementsCsv(`position_mm,seebeck_uV_per_K,sigma_S_per_cm,temperature_K\n${((zone.startMm + zone.endMm) / 2).toFixed(3)},${at350.seebeck * 1e6},${at350.sigma / 100},350`, 1.5);
    const [q] = reportMeasurements(caseJson, sheet, 3, parsed.points, 300).points;
    // On target at 350 K: within, though its S lies outside the band the sheet prints for 300 K.
    expect(q!.readings.map((r) => r.verdict)).toEqual(['within', 'within']);
    const s = q!.readings[0]!;
    expect(s.value < zone.seebeckBandUvK[0] || s.value > zone.seebeckBandUvK[1]).toBe(true);
  });

  it('turns Hall concentrations into carrier concentrations with the band model\'s Hall factor, or one entered by hand', () => {
    // What a Hall measurement of a piece grown to target reads: p_H = p / r_H, r_H from one parabolic band with
    // acoustic-phonon scattering (3π/8 non-degenerate … 1 degenerate: Putley 1960, from memory; see hall-factor.test.ts).
    const hallOf = (n: number): number => {
      let pH = n;
      for (let i = 0; i < 60; i += 1) pH = n / hallCorrection(material, pH, 300).factor;
      return pH;
    };
    const lines = ['position_mm,n_per_cm3'];
    for (let mm = 0.025; mm < 1.5; mm += 0.05) lines.push(`${mm.toFixed(3)},${hallOf(step.rows.find((r) => mm >= r.startMm && mm < r.endMm)!.perCm3).toPrecision(12)}`);
    const parsed = parseMeasurementsCsv(lines.join('\n'), 1.5);
    const report = reportMeasurements(caseJson, sheet, 3, parsed.points, 300);
    expect(report.hall).toMatchObject({ source: 'band-model' });
    expect(report.hall!.min).toBeGreaterThan(1);
    expect(report.hall!.max).toBeLessThan((3 * Math.PI) / 8);
    expect(report.hall!.note).toMatch(/band model/);
    report.points.forEach((q) => {
      const zone = step.rows.find((r) => q.positionMm >= r.startMm && q.positionMm < r.endMm)!;
      expect(Math.abs(Math.log10(q.perCm3 / zone.perCm3))).toBeLessThan(1e-6);
      expect(q.fromHall).toBeCloseTo(q.hallFactor! * q.hallPerCm3!, -10);
    });
    expect(report.verdicts.map((v) => v.verdict)).toEqual(['within', 'within', 'within']);
    expect(report.points.every((q) => q.readings.length === 1 && q.readings[0]!.kind === 'hall' && q.readings[0]!.verdict === 'within')).toBe(true);
    // Taken as the carrier concentration (r_H = 1 entered by hand), the same file reads low by log10 r_H.
    const asIs = reportMeasurements(caseJson, sheet, 3, parsed.points, 300, { hallFactor: 1 });
    expect(asIs.hall).toMatchObject({ source: 'entered', min: 1, max: 1 });
    const bias = Math.log10(report.points[0]!.perCm3 / asIs.points[0]!.perCm3);
    expect(bias).toBeCloseTo(Math.log10(report.points[0]!.hallFactor!), 9);
    expect(bias).toBeGreaterThan(0.02);
    // A measured-table family has no band model: factor 1, said so.
    const table = { ...caseJson, material: tableMaterial() };
    const fromTable = reportMeasurements(table, sheet, 3, parsed.points, 300);
    expect(fromTable.hall).toMatchObject({ source: 'none', min: 1, max: 1 });
    expect(fromTable.hall!.note).toMatch(/measured-table family has no band model/);
  });

  it('names bad measurement files by line and column', () => {
    expect(parseMeasurementsCsv('seebeck_uV_per_K\n200', 1.5).errors[0]!.message).toMatch(/position_mm/);
    expect(parseMeasurementsCsv('position_mm,seebeck_uV_per_K\n0.5,abc', 1.5).errors[0]).toMatchObject({ line: 2, column: 'seebeck_uV_per_K' });
    expect(parseMeasurementsCsv('position_mm,seebeck_uV_per_K\n2.5,200', 1.5).errors[0]!.message).toMatch(/outside the leg/);
    expect(parseMeasurementsCsv('position_mm,seebeck\n0.5,200', 1.5).errors[0]!.message).toMatch(/no unit/);
  });
});
