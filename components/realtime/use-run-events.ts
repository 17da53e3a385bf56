import { useCallback } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { runDetailKey, runsQueryKey } from '@/components/api/runs';
import type { RunStateEvent } from './events';

/**
 * What a `run:state` event means for the caches: every run list and sweep
 * may have changed, and the detail of that run (its result is stored now).
 */
export function useInvalidateOnRunState(): (event: RunStateEvent) => void {
  const queryClient = useQueryClient();
  return useCallback(
    (event: RunStateEvent) => {
      void queryClient.invalidateQueries({ queryKey: [...runsQueryKey, 'list'] });
      void queryClient.invalidateQueries({ queryKey: [...runsQueryKey, 'sweep'] });
      if (event.runId) void queryClient.invalidateQueries({ queryKey: runDetailKey(event.runId) });
    },
    [queryClient],
  );
}
