import type { GrowthOrderDetail, GrowthOrderDto, GrowthState } from '@/shared/api/growth';
import type { JointBandCheckView, ReportView, SheetView, SheetZone, YieldView } from '@/shared/api/growth-documents';

/** Invented ids and numbers for component tests. */
export const ids = {
  order: '66666666-6666-4666-8666-666666666666',
  run: '77777777-7777-4777-8777-777777777777',
  measurement: '88888888-8888-4888-8888-888888888888',
};

function zone(index: number, startMm: number, endMm: number, perCm3: number, extra: Partial<SheetZone> = {}): SheetZone {
  return {
    index, startMm, endMm, perCm3, lowPerCm3: perCm3 * 0.7, highPerCm3: perCm3 * 1.45, lowAtBound: false, highAtBound: false, lossAtLow: 0.98, lossAtHigh: 0.99,
    seebeckUvK: 150 + 60 * index, sigmaSCm: 1400 / (index + 1), seebeckBandUvK: [130 + 60 * index, 171 + 60 * index], sigmaBandSCm: [1000 / (index + 1), 1900 / (index + 1)],
    ...extra,
  };
}

/** Three zones on a 2 mm leg; the cold-end zone's band reaches the design's upper doping limit. */
export const threeZones: SheetZone[] = [
  zone(0, 0, 1.1, 3.1e19, { highPerCm3: 1e20, highAtBound: true }),
  zone(1, 1.1, 1.64, 1.2e19),
  zone(2, 1.64, 2, 2.9e18),
];

/** How the three-zone bands were made joint (invented numbers of the engine's shape). */
export const jointThree: JointBandCheckView = { method: 'all-corners', scale: 0.52, cornersSolved: 8, worstCornerLoss: 0.9997, perZoneWorstCornerLoss: 3.46 };

/** An invented yield: 600 legs, 16 bins ending at the design's 89.3 K. */
export const yieldThree: YieldView = {
  scatterDecades: 0.05, samples: 600, seed: 1412, meetsBudget: 0.977, budget: 1, target: 89.3, mean: 88.95, p05: 88.2, p50: 89.05, p95: 89.27, infeasible: 0,
  histogram: { edges: Array.from({ length: 17 }, (_, i) => 86.9 + 0.15 * i), counts: [1, 1, 2, 3, 4, 6, 9, 14, 22, 31, 45, 62, 84, 103, 118, 83], below: 12 },
};

export function sheet(overrides: Partial<SheetView> = {}): SheetView {
  return {
    unit: 'K', lossBudget: 1, measureTemperature: 300, dopingScatter: 0.05, lengthMm: 2, minZoneMm: 0.25,
    continuous: { value: 91.2, deltaT: 91.2 },
    steps: [
      { zones: 1, value: 77.4, deltaT: 77.4, current: 2.61, rows: [zone(0, 0, 2, 1.4e19)] },
      { zones: 2, value: 86.9, deltaT: 86.9, current: 3.05, rows: [zone(0, 0, 1.5, 2.2e19), zone(1, 1.5, 2, 4.1e18)] },
      { zones: 3, value: 89.3, deltaT: 89.3, current: 3.22, rows: threeZones, joint: jointThree, yield: yieldThree },
    ],
    ...overrides,
  };
}

export function order(overrides: Partial<GrowthOrderDto> = {}): GrowthOrderDto {
  return {
    id: ids.order, runId: ids.run, runNumber: 7, designName: 'Detector p-leg', batch: 'NL-TEST-007', dueDate: '2027-05-14', notes: 'Seed end is the cold end.',
    state: 'requested', closeReason: null, zones: 3, lossBudget: 1, measureTemperature: 300, sheetStatus: 'ready', sheetError: null,
    dopingScatter: 0.05, yieldStatus: 'ready', sheetProgress: null, releasedBy: 'Piet Okafor', createdAt: '2026-11-20T09:30:00.000Z', updatedAt: '2026-11-20T09:31:00.000Z',
    ...overrides,
  };
}

/** A report with zone 2 grown above its band, and zone 3 on target on average with one Seebeck reading above its band. */
export function report(): ReportView {
  return {
    zones: 3,
    points: [
      { line: 2, positionMm: 0.5, perCm3: 3.0e19, fromSeebeck: 2.9e19, fromSigma: 3.1e19, fromHall: null, disagree: false, outOfRange: false, zone: 0,
        readings: [{ kind: 'seebeck', value: 161, low: 150, high: 175, verdict: 'within' }, { kind: 'sigma', value: 1100, low: 900, high: 1300, verdict: 'within' }] },
      { line: 3, positionMm: 1.3, perCm3: 3.6e19, fromSeebeck: 2.6e19, fromSigma: 5.0e19, fromHall: null, disagree: true, outOfRange: false, zone: 1,
        readings: [{ kind: 'seebeck', value: 150, low: 170, high: 210, verdict: 'low' }, { kind: 'sigma', value: 1800, low: 700, high: 1200, verdict: 'high' }] },
      { line: 4, positionMm: 1.8, perCm3: 3.0e18, fromSeebeck: 3.0e18, fromSigma: 3.0e18, fromHall: null, disagree: false, outOfRange: false, zone: 2,
        readings: [{ kind: 'seebeck', value: 312, low: 246, high: 304, verdict: 'high' }, { kind: 'sigma', value: 310, low: 306, high: 603, verdict: 'within' }] },
    ],
    verdicts: [
      { zone: 0, measured: 3.0e19, verdict: 'within', points: 1, readings: 2, readingsOutside: 0 },
      { zone: 1, measured: 3.6e19, verdict: 'high', points: 1, readings: 2, readingsOutside: 2 },
      { zone: 2, measured: 3.0e18, verdict: 'stray', points: 1, readings: 2, readingsOutside: 1 },
    ],
    target: { value: 89.3, deltaT: 89.3, current: 3.22 },
    asGrown: { atDesignCurrent: { value: 84.1, deltaT: 84.1, feasible: true }, atBestCurrent: { value: 85.0, deltaT: 85.0, current: 3.4, feasible: true } },
    warnings: ['line 3 (1.3 mm): the doping inferred from each measurement differs by more than 0.15 decades'],
  };
}

export function detail(state: GrowthState = 'requested', extra: Partial<GrowthOrderDetail> = {}): GrowthOrderDetail {
  return {
    order: order({ state, closeReason: state === 'rejected' ? 'Zone 2 over-doped.' : null }),
    sheet: sheet() as unknown as Record<string, unknown>,
    timeline: [{ at: '2026-11-20T09:30:00.000Z', by: 'Piet Okafor', kind: 'released', fromState: null, toState: 'requested', note: 'Seed end is the cold end.' }],
    measurements: [],
    ...extra,
  };
}

export const withReport = (state: GrowthState = 'measured') =>
  detail(state, { measurements: [{ id: ids.measurement, uploadedBy: 'Greta Moreau', uploadedAt: '2026-11-28T15:00:00.000Z', temperature: 300, report: report() as unknown as Record<string, unknown> }] });

export type Reply = { status: number; body: unknown };
export type SentRequest = { method: string; url: string; body: unknown };

/** Replaces `fetch` with answers by "METHOD url"; unknown routes answer 404. Records every request. */
export function routeFetch(routes: Record<string, Reply | ((req: SentRequest) => Reply)>) {
  const requests: SentRequest[] = [];
  const fake = jest.fn(async (input: unknown, init?: RequestInit) => {
    const req = { method: init?.method ?? 'GET', url: String(input), body: typeof init?.body === 'string' ? (JSON.parse(init.body) as unknown) : init?.body };
    requests.push(req);
    const route = routes[`${req.method} ${req.url}`];
    const reply = typeof route === 'function' ? route(req) : (route ?? { status: 404, body: { name: 'NotFound', message: `no route for ${req.method} ${req.url}` } });
    return { ok: reply.status >= 200 && reply.status < 300, status: reply.status, text: async () => (typeof reply.body === 'string' ? reply.body : JSON.stringify(reply.body)) };
  });
  global.fetch = fake as unknown as typeof fetch;
  return { requests };
}
