// Relative imports: the end-to-end project (no `@/` alias) reads these fixtures too.
import { cascadeResultSchema, coolerRunDetailSchema, coolerSchema, coolerSummarySchema, coupleResultSchema, type Cooler, type CoolerRunDetail, type CoolerSummary } from '../../../shared/api/coolers';
import { runSummarySchema, type RunState } from '../../../shared/api/runs';

/** Invented ids of the Northlight demo's cascade, couple and their runs. Every fixture goes through the contract's schema, so it cannot drift from it. */
export const coolerIds = {
  cascade: 'cccccccc-cccc-4ccc-8ccc-cccccccccccc',
  couple: 'dddddddd-dddd-4ddd-8ddd-dddddddddddd',
  cascadeRun: '77777777-7777-4777-8777-777777777777',
  coupleRun: '88888888-8888-4888-8888-888888888888',
  familyP: '11111111-1111-4111-8111-111111111111',
  familyN: '55555555-5555-4555-8555-555555555555',
};

const stage = (coldSide: number, hotSide: number, couples: number, heatLoad: number, power: number) => ({
  coldSide, hotSide, current: 1.8, voltage: power / 1.8, power, heatLoad, heatRejected: heatLoad + power, couples,
});

/** A 3-stage cascade result: 4, 12 and 36 couples from 203 K to 300 K at 5 mW. */
export function cascadeResult() {
  const stages = [stage(203.2, 231.5, 4, 0.005, 0.09), stage(231.5, 262.8, 12, 0.095, 0.42), stage(262.8, 300, 36, 0.515, 1.6)];
  const curve = (n: number) => ({ stages: n, points: [200, 220, 240, 260].map((t, i) => ({ coldSide: t + 15 * (3 - n), heatLoad: 0.002 * (i + 1) * n, current: [1.8], power: 2 })) });
  return cascadeResultSchema.parse({
    hotSide: 300, coldSide: 203.2, deltaT: 96.8, heatLoad: 0.005, objective: 'maxDeltaT', wiring: 'series', stages,
    power: 2.11, cop: 0.005 / 2.11, curves: [curve(3), curve(2), curve(1)], evaluations: 4200, seconds: 9.5,
  });
}

export function coupleResult() {
  const leg = (optimised: boolean, currentDensity: number, ownCurrentDensity: number) => ({
    length: 1.5e-3, area: 1e-6, doping: { x: [0, 0.5, 1], perCm3: [3e19, 1.5e19, 6e18] }, optimised, currentDensity, ownCurrentDensity, leg: { length: 1.5e-3 },
  });
  return coupleResultSchema.parse({
    hotSide: 300, coldSide: 228.4, deltaT: 71.6, heatLoad: 0, current: 3.1, voltage: 0.06, power: 0.19, cop: null, areaRatio: 0.82,
    objective: { kind: 'maxDeltaT', value: 71.6 }, p: leg(true, 3.1e6, 2.8e6), n: leg(false, 3.78e6, 3.9e6),
    mismatch: { separateObjective: 72.9, cost: 1.3, unit: 'K' }, evaluations: 900, seconds: 3.2,
  });
}

const stamp = { createdBy: 'Piet', createdAt: '2026-12-01T10:00:00.000Z', updatedAt: '2026-12-01T11:00:00.000Z' };
const family = (familyId: string) => ({ kind: 'family', familyId, perCm3: 2e19, lengthMm: 1.5, areaMm2: 1 });

export function cascadeCooler(): Cooler {
  return coolerSchema.parse({
    id: coolerIds.cascade, kind: 'cascade', name: 'Detector cascade, 3 stages', notes: '', case: {}, ...stamp,
    input: {
      kind: 'cascade', name: 'Detector cascade, 3 stages', hotSide: 300, heatLoad: 0.005, objective: 'maxDeltaT', wiring: 'series',
      stages: [4, 12, 36].map((couples) => ({ couples, source: { kind: 'legs', p: family(coolerIds.familyP), n: family(coolerIds.familyN) }, interfaceResistance: 0.5 })),
    },
  });
}

export function coupleCooler(): Cooler {
  return coolerSchema.parse({
    id: coolerIds.couple, kind: 'couple', name: 'Matched detector couple', notes: '', case: {}, ...stamp,
    input: { kind: 'couple', name: 'Matched detector couple', p: family(coolerIds.familyP), n: family(coolerIds.familyN), hotSide: 300 },
  });
}

export function coolerSummary(c: Cooler, latest: CoolerSummary['latestRun'] = null): CoolerSummary {
  const { case: _case, ...rest } = c;
  return coolerSummarySchema.parse({ ...rest, latestRun: latest });
}

/** A cooler run's detail as `GET /api/runs/:id` answers it. */
export function coolerRunDetail(kind: 'cascade' | 'couple', state: RunState): CoolerRunDetail {
  const cooler = kind === 'cascade' ? cascadeCooler() : coupleCooler();
  const result = state === 'succeeded' ? (kind === 'cascade' ? cascadeResult() : coupleResult()) : null;
  const finished = state === 'succeeded' || state === 'failed' || state === 'cancelled';
  const run = runSummarySchema.parse({
    id: kind === 'cascade' ? coolerIds.cascadeRun : coolerIds.coupleRun, number: kind === 'cascade' ? 9 : 8, kind, designId: null, coolerId: cooler.id, designName: cooler.name,
    sweepId: null, sweepValue: null, state, objective: 'maxDeltaT', best: result ? result.deltaT : null, deltaT: result ? result.deltaT : null,
    fractionDone: state === 'succeeded' ? 1 : 0, starts: 4, launchedBy: 'Piet', createdAt: '2026-12-01T12:00:00.000Z',
    startedAt: state === 'queued' ? null : '2026-12-01T12:00:02.000Z', finishedAt: finished ? '2026-12-01T12:00:12.000Z' : null, error: null,
    attempts: state === 'queued' ? 0 : 1, waiting: state === 'queued' ? { position: 1, reason: 'Next in line.' } : null, bipolar: null,
  });
  return coolerRunDetailSchema.parse({
    run, cooler, case: {}, progress: null, trace: [], traceTotal: 0,
    result: result ? { ...result, search: { startsDone: 4, bestStart: 1, starts: 4 } } : null, engineVersion: '0.2.0-test',
  });
}
