import type { RunProgress, RunSummary, RunWaiting } from '../../shared/api';
import { bipolarOfProfile, type MaterialInput, type ProfileLike } from '../../shared/engine';
import type { Run } from '../db/entities';
import { frozenStarts } from '../runs/run-starts';
import { coolerHeadline, coolerResultOf } from '../../shared/runs/cooler-results';

/** What a run ran, by name: its design's (leg run) or its cooler's (couple, cascade), as frozen at launch. */
export function runName(r: Pick<Run, 'kind' | 'designSnapshot' | 'coolerSnapshot'>): string {
  const snap = r.kind === 'leg' ? r.designSnapshot : r.coolerSnapshot;
  return String(snap?.name ?? '');
}

/** best / deltaT of a finished (or cancelled-with-a-best) run; null when there is no result. */
function headline(r: Run): { best: number | null; deltaT: number | null } {
  if (r.kind === 'leg') {
    const res = r.result as { objective?: { value: number }; deltaT?: number } | null;
    return { best: res?.objective?.value ?? null, deltaT: res?.deltaT ?? null };
  }
  const parsed = coolerResultOf(r.kind, r.result);
  if (!parsed) return { best: null, deltaT: null };
  const h = coolerHeadline(parsed);
  return { best: h.best, deltaT: h.deltaT };
}

export function summarise(r: Run, launchedBy: string, waiting: RunWaiting | null = null): RunSummary {
  const p = r.progress as Partial<RunProgress> | null;
  const h = headline(r);
  const profile = r.kind === 'leg' ? (r.result as { profile?: ProfileLike } | null)?.profile : undefined;
  return {
    id: r.id, number: r.number, kind: r.kind, designId: r.designId, coolerId: r.coolerId, designName: runName(r), sweepId: r.sweepId, sweepValue: r.sweepValue, state: r.state, objective: r.objective,
    best: h.best ?? p?.best ?? null, deltaT: h.deltaT,
    fractionDone: r.state === 'succeeded' ? 1 : p?.fractionDone ?? 0,
    starts: frozenStarts(r.kind, r.designSnapshot, r.coolerSnapshot),
    launchedBy, createdAt: r.createdAt.toISOString(), startedAt: r.startedAt?.toISOString() ?? null, finishedAt: r.finishedAt?.toISOString() ?? null,
    error: r.error, attempts: r.attempts, waiting: r.state === 'queued' ? waiting : null,
    // One neutrality solve per profile point, and only for two-band families: cheap enough for every list.
    // A couple's or cascade's legs are several materials: no single profile to judge here.
    bipolar: r.kind === 'leg' ? bipolarOfProfile(r.caseJson.material as MaterialInput | undefined, profile) : null,
  };
}
