import { useCallback, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { runDetailKey } from '@/components/api/runs';
import type { RunProgress } from '@/shared/api/runs';
import { runRoom } from './events';
import { useRealtime, type ConnectionState } from './use-realtime';
import { useInvalidateOnRunState } from './use-run-events';

/** One progress report of a run: its objective at that moment and the best so far. */
export type TracePoint = { iteration: number; objective: number; best: number; seconds: number };

export type RunProgressState = {
  /** The latest `run:progress` event received, or null before the first. */
  latest: RunProgress | null;
  /** Every report received live, oldest first (the stored trace covers what came before). */
  live: TracePoint[];
  connection: ConnectionState;
};

/** Keeps the page light on a run that reports for hours: older live points are thinned. */
const maxLivePoints = 2000;

function append(points: TracePoint[], p: RunProgress): TracePoint[] {
  const next = [...points, { iteration: p.iteration, objective: p.objective, best: p.best, seconds: p.elapsedSeconds }];
  return next.length > maxLivePoints ? next.filter((_, i) => i % 2 === 0 || i === next.length - 1) : next;
}

/**
 * Live progress of one run while `active` (queued or running): watches the
 * run's room, keeps the latest report and the reports so far, and refreshes
 * the run's queries when its state changes (so the page shows the stored
 * result the moment the worker writes it). No socket once it has finished.
 */
export function useRunProgress(runId: string, active: boolean): RunProgressState {
  const [latest, setLatest] = useState<RunProgress | null>(null);
  const [live, setLive] = useState<TracePoint[]>([]);
  const invalidate = useInvalidateOnRunState();
  const queryClient = useQueryClient();
  // The run may have started (or ended) between loading the page and joining its room.
  const onWatching = useCallback(() => void queryClient.invalidateQueries({ queryKey: runDetailKey(runId) }), [queryClient, runId]);
  const onProgress = useCallback(
    (p: RunProgress) => {
      if (p.runId !== runId) return;
      setLatest(p);
      setLive((points) => append(points, p));
    },
    [runId],
  );
  const connection = useRealtime({
    rooms: active && runId ? [runRoom(runId)] : [],
    enabled: active && runId.length > 0,
    onProgress,
    onState: invalidate,
    onWatching,
  });
  return { latest, live, connection };
}
