import type { Design } from '@/shared/api/designs';
import type { FamiliesResponse, FamilyDetailResponse } from '@/shared/api/families';
import type { RunDetail, RunProgress, RunState, RunSummary } from '@/shared/api/runs';
import { optimizeLeg, parseCase, type MaterialInput } from '@/shared/engine';
import { designToCase } from '@/shared/runs/design-case';

/** Invented ids and values for component tests. */
export const ids = {
  family: '11111111-1111-4111-8111-111111111111',
  design: '22222222-2222-4222-8222-222222222222',
  run: '33333333-3333-4333-8333-333333333333',
  sweep: '44444444-4444-4444-8444-444444444444',
};

export const team = { id: 'team-1', name: 'Northlight Sensors — detector cooling group' };

export const pBand: MaterialInput = {
  kind: 'band',
  carrier: 'p',
  effectiveMass: 1.0,
  mobility300: 350,
  mobilityExponent: -1.5,
  latticeKappa300: 1.0,
  latticeKappaExponent: -1,
};

export function familiesResponse(): FamiliesResponse {
  const base = { summary: '', source: 'Invented for tests', createdBy: 'ada@northlight.example', createdAt: '2026-01-05T10:00:00.000Z', isDemo: false, archived: false, updatedAt: '2026-01-05T10:00:00.000Z' };
  return {
    team,
    families: [
      { ...base, id: ids.family, name: 'Test p-type band model', kind: 'band', carrier: 'p', version: 2 },
      { ...base, id: '55555555-5555-4555-8555-555555555555', name: 'Reference constant leg', kind: 'constant', carrier: null, version: 1 },
    ],
  };
}

export function familyDetail(): FamilyDetailResponse {
  const family = familiesResponse().families[0];
  const version = { version: 2, summary: '', source: 'Invented for tests', createdBy: 'ada@northlight.example', createdAt: '2026-01-05T10:00:00.000Z', runCount: 0 };
  return { family, current: { ...version, definition: pBand }, versions: [version] };
}

export function design(overrides: Partial<Design> = {}): Design {
  return {
    id: ids.design,
    name: 'Detector p-leg',
    notes: '',
    familyId: ids.family,
    familyName: 'Test p-type band model',
    familyVersion: 2,
    carrier: 'p',
    lengthMm: 1.5,
    areaMm2: 1,
    hotSide: 300,
    objective: 'maxDeltaT',
    heatLoad: 0,
    coldSide: null,
    minPerCm3: 1e18,
    maxPerCm3: 1e20,
    controlPoints: 4,
    monotone: false,
    starts: 16,
    minZoneMm: 0,
    coldContactMicroOhmCm2: 0,
    hotContactMicroOhmCm2: 0,
    parasitic: 'none',
    parasiticLoadW: 0,
    emissivity: 0,
    surroundingsK: null,
    createdBy: 'Piet',
    createdAt: '2026-02-01T09:00:00.000Z',
    updatedAt: '2026-02-01T09:00:00.000Z',
    following: true,
    ...overrides,
  };
}

export function runSummary(state: RunState, overrides: Partial<RunSummary> = {}): RunSummary {
  const finished = state === 'succeeded' || state === 'failed' || state === 'cancelled';
  return {
    id: ids.run,
    number: 7,
    kind: 'leg',
    designId: ids.design,
    coolerId: null,
    designName: 'Detector p-leg',
    sweepId: null,
    sweepValue: null,
    state,
    objective: 'maxDeltaT',
    best: null,
    deltaT: null,
    fractionDone: state === 'succeeded' ? 1 : 0,
    starts: 16,
    launchedBy: 'Piet',
    createdAt: '2026-02-01T10:00:00.000Z',
    startedAt: state === 'queued' ? null : '2026-02-01T10:00:02.000Z',
    finishedAt: finished ? '2026-02-01T10:00:14.500Z' : null,
    error: state === 'failed' ? 'the engine refused hotSide: no current gives a steady state' : null,
    attempts: state === 'queued' ? 0 : 1,
    waiting: state === 'queued' ? { position: 2, reason: '1 run ahead of it in the queue (each team\'s first waiting run goes before any team\'s second).' } : null,
    bipolar: null,
    ...overrides,
  };
}

/** The engine's own answer for the test design, computed once (a fraction of a second). */
let cached: Record<string, unknown> | null = null;
export function engineResult(): Record<string, unknown> {
  if (!cached) {
    const d = design();
    const r = optimizeLeg(parseCase(designToCase(d, pBand), 'optimize'));
    cached = JSON.parse(JSON.stringify({ ...r, search: { starts: 16, startsDone: 16, bestStart: 3 } })) as Record<string, unknown>;
  }
  return cached;
}

export function runDetail(state: RunState, options: { result?: boolean; progress?: RunProgress | null } = {}): RunDetail {
  const d = design();
  const result = options.result ? engineResult() : null;
  const value = result ? (result.objective as { value: number }).value : null;
  return {
    run: runSummary(state, value === null ? {} : { best: value, deltaT: result?.deltaT as number }),
    design: d,
    case: designToCase(d, pBand) as Record<string, unknown>,
    familyVersion: 2,
    progress: options.progress ?? null,
    trace: [],
    traceTotal: 0,
    result,
    engineVersion: '0.1.0-test',
  };
}

export function progress(overrides: Partial<RunProgress> = {}): RunProgress {
  return {
    runId: ids.run,
    phase: 'profile · start 3 of 16',
    iteration: 12,
    objective: 80.5,
    best: 84.25,
    // The run's best came from an earlier start, at another current than the start being searched.
    bestCurrent: 3.86,
    start: { number: 3, of: 16, best: 80.5, current: 2.79 },
    doping: { x: [0, 1 / 3, 2 / 3, 1], perCm3: [4e19, 2e19, 6e18, 1e18] },
    fractionDone: 0.4,
    evaluations: 900,
    elapsedSeconds: 5.5,
    at: '2026-02-01T10:00:07.500Z',
    ...overrides,
  };
}

export type Reply = { status: number; body: unknown };
export type SentRequest = { method: string; url: string; body: unknown };

/**
 * Replaces `fetch` with answers chosen by "METHOD path" (the path with its
 * query); a function answer sees the request. Unknown requests answer 404.
 */
export function routeFetch(routes: Record<string, Reply | ((req: SentRequest) => Reply)>) {
  const requests: SentRequest[] = [];
  const fake = jest.fn(async (input: unknown, init?: RequestInit) => {
    const req = { method: init?.method ?? 'GET', url: String(input), body: typeof init?.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined };
    requests.push(req);
    const route = routes[`${req.method} ${req.url}`];
    const reply = typeof route === 'function' ? route(req) : (route ?? { status: 404, body: { name: 'NotFound', message: `no route for ${req.method} ${req.url}` } });
    return { ok: reply.status >= 200 && reply.status < 300, status: reply.status, text: async () => JSON.stringify(reply.body) };
  });
  global.fetch = fake as unknown as typeof fetch;
  return { requests };
}
