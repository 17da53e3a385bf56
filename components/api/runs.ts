import { useMutation, useQueries, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { anyRunDetailSchema, type AnyRunDetail, type CoolerRunDetail } from '@/shared/api/coolers';
import {
  runSummarySchema,
  runsResponseSchema,
  sweepSchema,
  type RunDetail,
  type RunState,
  type RunSummary,
  type SweepRequest,
} from '@/shared/api/runs';
import { apiBaseUrl, apiGet, apiSend } from './client';

/** Every runs and sweeps query starts with this key: a `run:state` event refreshes them all. */
export const runsQueryKey = ['runs'] as const;

export type RunFilter = { designId?: string; sweepId?: string; coolerId?: string };

export const runListKey = (filter: RunFilter = {}) => [...runsQueryKey, 'list', filter.designId ?? '', filter.sweepId ?? '', filter.coolerId ?? ''] as const;
export const runDetailKey = (id: string) => [...runsQueryKey, 'detail', id] as const;
export const sweepKey = (id: string) => [...runsQueryKey, 'sweep', id] as const;

/** `POST /api/designs/:id/runs` and `POST /api/runs/:id/cancel` answer `{ run }`. */
export const runEnvelopeSchema = z.object({ run: runSummarySchema });
/** `POST /api/designs/:id/sweeps` and `GET /api/sweeps/:id` answer `{ sweep }`. */
export const sweepEnvelopeSchema = z.object({ sweep: sweepSchema });

/** States after which a run changes no more. */
export const finishedStates: readonly RunState[] = ['succeeded', 'failed', 'cancelled'];
export const isFinished = (state: RunState) => finishedStates.includes(state);

/** A finished run that kept a design (succeeded, or cancelled with a best so far): one to compare or build on. */
export const hasResult = (r: Pick<RunSummary, 'state' | 'best'>) => isFinished(r.state) && r.best !== null;

function listPath(filter: RunFilter): string {
  const query = new URLSearchParams();
  if (filter.designId) query.set('designId', filter.designId);
  if (filter.sweepId) query.set('sweepId', filter.sweepId);
  if (filter.coolerId) query.set('coolerId', filter.coolerId);
  const text = query.toString();
  return text ? `/api/runs?${text}` : '/api/runs';
}

/**
 * A waiting run's place in line changes when other teams' runs start or end,
 * which this team hears nothing of: while one waits, look again every few seconds.
 */
const whileWaitingMs = 5000;

/** `GET /api/runs?designId=&sweepId=&coolerId=`: newest first (at most 200). */
export function useRuns(filter: RunFilter = {}) {
  return useQuery({
    queryKey: runListKey(filter),
    queryFn: ({ signal }) => apiGet(listPath(filter), runsResponseSchema, { signal }),
    refetchInterval: (q) => (q.state.data?.runs.some((r) => r.state === 'queued') ? whileWaitingMs : false),
  });
}

const runPath = (id: string) => `/api/runs/${encodeURIComponent(id)}`;
const runDetailQuery = (id: string) => ({
  queryKey: runDetailKey(id),
  queryFn: ({ signal }: { signal: AbortSignal }) => apiGet(runPath(id), anyRunDetailSchema, { signal }),
  enabled: id.length > 0,
  refetchInterval: (q: { state: { data?: AnyRunDetail } }) => (q.state.data?.run.state === 'queued' ? whileWaitingMs : false),
});

/** A leg run's detail (a design and a leg result) rather than a couple's or a cascade's (a cooler). */
export const isLegRunDetail = (d: AnyRunDetail): d is RunDetail => !('cooler' in d);
export const isCoolerRunDetail = (d: AnyRunDetail): d is CoolerRunDetail => 'cooler' in d;

/** `GET /api/runs/:id`: the frozen design (or cooler), progress, trace and (when finished) the result; any kind of run. */
export function useRunDetail(id: string) {
  return useQuery(runDetailQuery(id));
}

/** Several runs at once, for comparing them side by side. */
export function useRunDetails(ids: readonly string[]) {
  return useQueries({ queries: ids.map(runDetailQuery) });
}

/** `GET /api/sweeps/:id`: the sweep and its runs (one per value, `sweepValue` each). */
export function useSweep(id: string) {
  return useQuery({
    queryKey: sweepKey(id),
    queryFn: ({ signal }) => apiGet(`/api/sweeps/${encodeURIComponent(id)}`, sweepEnvelopeSchema, { signal }),
    enabled: id.length > 0,
  });
}

function useRefreshRuns() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: runsQueryKey });
}

/** `POST /api/designs/:id/runs`: freezes the design and family version, queues one job. */
export function useLaunchRun() {
  const onSuccess = useRefreshRuns();
  return useMutation({
    mutationFn: (designId: string) =>
      apiSend('POST', `/api/designs/${encodeURIComponent(designId)}/runs`, { none: true }, runEnvelopeSchema),
    onSuccess,
  });
}

export type LaunchSweepVariables = { designId: string; body: SweepRequest };

/** `POST /api/designs/:id/sweeps`: one run (and job) per value. */
export function useLaunchSweep() {
  const onSuccess = useRefreshRuns();
  return useMutation({
    mutationFn: ({ designId, body }: LaunchSweepVariables) =>
      apiSend('POST', `/api/designs/${encodeURIComponent(designId)}/sweeps`, { json: body }, sweepEnvelopeSchema),
    onSuccess,
  });
}

/** `POST /api/runs/:id/cancel`: a queued run stops at once, a running one within about a second. */
export function useCancelRun() {
  const onSuccess = useRefreshRuns();
  return useMutation({
    mutationFn: (runId: string) => apiSend('POST', `${runPath(runId)}/cancel`, { none: true }, runEnvelopeSchema),
    onSuccess,
  });
}

/** Download address of a run's converged profile (CSV, trade units) or everything (JSON). */
export function runExportUrl(id: string, format: 'csv' | 'json'): string {
  return `${apiBaseUrl()}${runPath(id)}/export.${format}`;
}
