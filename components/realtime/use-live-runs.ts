import { useCallback, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { RunProgress, RunSummary } from '@/shared/api/runs';
import { isFinished, runsQueryKey } from '@/components/api/runs';
import { runRoom } from './events';
import { useRealtime, type ConnectionState } from './use-realtime';
import { useInvalidateOnRunState } from './use-run-events';

export type LiveRuns = {
  /** Latest progress per run id, for the runs still going. */
  progress: Readonly<Record<string, RunProgress>>;
  connection: ConnectionState;
};

/**
 * For pages that list runs (runs list, a sweep): watches every run that is
 * still queued or running, keeps each one's latest progress, and refreshes
 * the lists when any run of the team changes state. `listen` keeps the
 * socket open even when nothing on the page is running (a run launched
 * elsewhere then appears at once).
 */
export function useLiveRuns(runs: readonly RunSummary[] | undefined, listen = false): LiveRuns {
  const [progress, setProgress] = useState<Record<string, RunProgress>>({});
  const invalidate = useInvalidateOnRunState();
  const active = (runs ?? []).filter((r) => !isFinished(r.state)).map((r) => r.id);
  const queryClient = useQueryClient();
  const onProgress = useCallback((p: RunProgress) => setProgress((all) => ({ ...all, [p.runId]: p })), []);
  // Lists may have changed between loading and joining the rooms.
  const onWatching = useCallback(() => {
    void queryClient.invalidateQueries({ queryKey: [...runsQueryKey, 'list'] });
    void queryClient.invalidateQueries({ queryKey: [...runsQueryKey, 'sweep'] });
  }, [queryClient]);
  const connection = useRealtime({
    rooms: active.map(runRoom),
    enabled: runs !== undefined && (listen || active.length > 0),
    onProgress,
    onState: invalidate,
    onWatching,
  });
  return { progress, connection };
}
