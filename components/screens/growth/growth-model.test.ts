import { growerStates } from '@/shared/api/growth';
import { bandText } from './growth-format';
import { nextState, sortOrders } from './growth-state';
import { issueFromField } from './measurement-upload';
import { checkRelease, emptyRelease } from './release-form-model';
import { zoneSteps } from './report-series';
import { checkSettings } from './sheet-settings';
import { stepsOf } from './state-stepper';
import { order, threeZones } from './test-fixtures';
import { deltaTAxis } from './zone-count-chart';
import { labelRows } from './zone-diagram';

describe('order states', () => {
  it('moves one grower step at a time and stops at measured', () => {
    for (let i = 0; i < growerStates.length - 1; i++) expect(nextState(growerStates[i])).toBe(growerStates[i + 1]);
    expect(nextState('measured')).toBeNull();
    expect(nextState('approved')).toBeNull();
    expect(nextState('rejected')).toBeNull();
  });

  it('marks steps done, current and to do, and the verdict once closed', () => {
    expect(stepsOf('growing').map((s) => s.status)).toEqual(['done', 'done', 'current', 'todo', 'todo', 'todo']);
    const closed = stepsOf('rejected');
    expect(closed.slice(0, 5).every((s) => s.status === 'done')).toBe(true);
    expect(closed[5]).toMatchObject({ label: 'Rejected', status: 'current', glyph: 'cross' });
  });

  it('lists open orders by due date (undated last), closed ones after', () => {
    const list = [
      order({ id: 'a', dueDate: null }),
      order({ id: 'b', dueDate: '2027-03-01' }),
      order({ id: 'c', state: 'approved', dueDate: '2026-01-01' }),
      order({ id: 'd', dueDate: '2027-01-15' }),
    ];
    expect(sortOrders(list).map((o) => o.id)).toEqual(['d', 'b', 'a', 'c']);
  });
});

describe('forms, checked with the API’s schemas', () => {
  it('a release needs a batch, a real date and K in 1–12', () => {
    const bad = checkRelease({ ...emptyRelease, zones: '0', dueDate: 'soon' });
    expect(bad).toEqual({ ok: false, problems: { batch: 'Batch is required', dueDate: 'Due date must be a date like 2027-01-31', zones: 'Zones K must be 1–12' } });
    const good = checkRelease({ ...emptyRelease, batch: ' NL-1 ', lossBudget: '0.5' });
    expect(good).toEqual({ ok: true, body: { batch: ' NL-1 ', dueDate: undefined, notes: '', zones: 3, lossBudget: 0.5, measureTemperature: 300 } });
  });

  it('sheet settings refuse a blank budget and a temperature in °C', () => {
    expect(checkSettings({ zones: 4, lossBudget: '', measureTemperature: '27' })).toEqual({
      ok: false,
      problems: { lossBudget: 'ΔT loss budget must be a number', measureTemperature: 'Check temperature is in kelvin (200–400 K)' },
    });
    expect(checkSettings({ zones: 4, lossBudget: '2', measureTemperature: '295' })).toEqual({ ok: true, value: { zones: 4, lossBudget: 2, measureTemperature: 295 } });
  });

  it('reads the API’s located CSV fields back into line and column', () => {
    expect(issueFromField('file:line 12:seebeck_uV_per_K', 'not a number')).toEqual({ line: 12, column: 'seebeck_uV_per_K', message: 'not a number' });
    expect(issueFromField('file:line 3', 'no value')).toEqual({ line: 3, column: undefined, message: 'no value' });
    expect(issueFromField('file', 'empty')).toEqual({ line: undefined, column: undefined, message: 'empty' });
  });
});

describe('drawing helpers', () => {
  it('draws zone steps flat across each zone with a jump just before each boundary', () => {
    const pts = zoneSteps(threeZones, (z) => z.perCm3, 2);
    expect(pts).toHaveLength(2 * threeZones.length);
    threeZones.forEach((z, i) => {
      expect(pts[2 * i]).toEqual({ x: z.startMm, y: z.perCm3 });
      expect(pts[2 * i + 1].y).toBe(z.perCm3);
      expect(z.endMm - pts[2 * i + 1].x).toBeLessThan(1e-3);
    });
    // Distinct x everywhere, so the plot keeps both corners of every jump.
    expect(new Set(pts.map((p) => p.x)).size).toBe(pts.length);
  });

  it('puts close boundary labels on a second row', () => {
    expect(labelRows([0, 0.5, 1], 300)).toEqual([0, 0, 0]);
    expect(labelRows([0, 0.55, 0.65, 1], 300)).toEqual([0, 0, 1, 0]);
  });

  it('spans the ΔT axis over every K and the continuous optimum with round ticks', () => {
    const { lo, hi, ticks } = deltaTAxis([77.4, 86.9, 89.3, 91.2]);
    expect(lo).toBeLessThanOrEqual(77.4);
    expect(hi).toBeGreaterThan(91.2);
    expect(ticks[0]).toBe(lo);
    expect(ticks[ticks.length - 1]).toBeCloseTo(hi, 9);
    const steps = ticks.slice(1).map((t, i) => t - ticks[i]);
    expect(new Set(steps.map((s) => s.toFixed(6))).size).toBe(1);
  });

  it('writes a band with its unit and the bound mark', () => {
    expect(bandText(threeZones[0])).toMatch(/^2\.17 × 10¹⁹ – ≥ 1 × 10²⁰ \(bound\)\u202fcm⁻³$/);
  });
});
