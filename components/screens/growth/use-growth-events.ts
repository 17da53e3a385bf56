import { useEffect } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { idSchema } from '@/shared/api/common';
import { growthListKey, growthOrderKey } from '@/components/api/growth';
import { openSocket } from '@/components/realtime/socket';

/** `growth:changed` as the API relays it to the team's room. */
export const growthChangedSchema = z.object({ orderId: idSchema });

/**
 * Keeps growth pages current: a release, a state change, new measurements
 * or a finished sheet anywhere in the team refreshes the list and that
 * order. One socket per page, closed with its listeners on unmount; pages
 * also poll while a sheet computes, so a missed event only delays.
 */
export function useGrowthEvents(enabled = true): void {
  const queryClient = useQueryClient();
  useEffect(() => {
    if (!enabled) return undefined;
    const socket = openSocket(queryClient);
    socket.on('growth:changed', (raw: unknown) => {
      const parsed = growthChangedSchema.safeParse(raw);
      if (!parsed.success) return;
      void queryClient.invalidateQueries({ queryKey: growthListKey });
      void queryClient.invalidateQueries({ queryKey: growthOrderKey(parsed.data.orderId) });
    });
    return () => {
      socket.removeAllListeners();
      socket.disconnect();
    };
  }, [enabled, queryClient]);
}
