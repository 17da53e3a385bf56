import { useEffect, useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { Socket } from 'socket.io-client';
import { runProgressSchema, type RunProgress } from '@/shared/api/runs';
import { runStateEventSchema, type RunStateEvent } from './events';
import { openSocket } from './socket';

/** Whether live events are arriving: shown beside live numbers, in words. */
export type ConnectionState = 'off' | 'connecting' | 'live' | 'offline';

export type RealtimeOptions = {
  /** Object rooms to watch (`run:<id>`); the team's room is always joined. */
  rooms: readonly string[];
  /** No socket at all while false (e.g. every run on the page has finished). */
  enabled: boolean;
  onProgress?: (progress: RunProgress) => void;
  onState?: (event: RunStateEvent) => void;
  /**
   * After each (re)connect, once every room has answered its `watch`: from
   * here on no event is missed, so this is the moment to refetch whatever
   * may have changed before (e.g. a run that started while the page loaded).
   */
  onWatching?: () => void;
};

/**
 * One socket for the life of the component: connected in an effect,
 * `removeAllListeners()` and `disconnect()` on unmount. Rooms are watched on
 * every (re)connect and when the list changes; events are checked against
 * the shared schemas before they reach the handlers.
 */
export function useRealtime({ rooms, enabled, onProgress, onState, onWatching }: RealtimeOptions): ConnectionState {
  const queryClient = useQueryClient();
  const [state, setState] = useState<ConnectionState>(enabled ? 'connecting' : 'off');
  const socketRef = useRef<Socket | null>(null);
  const roomsRef = useRef<readonly string[]>(rooms);
  const handlers = useRef({ onProgress, onState, onWatching });
  useEffect(() => {
    handlers.current = { onProgress, onState, onWatching };
  }, [onProgress, onState, onWatching]);

  useEffect(() => {
    if (!enabled) {
      setState('off');
      return undefined;
    }
    const socket = openSocket(queryClient);
    socketRef.current = socket;
    setState('connecting');
    socket.on('connect', () => {
      setState('live');
      const rooms = roomsRef.current;
      let waiting = rooms.length;
      const answered = () => {
        waiting -= 1;
        if (waiting === 0) handlers.current.onWatching?.();
      };
      if (rooms.length === 0) handlers.current.onWatching?.();
      for (const room of rooms) socket.emit('watch', room, answered);
    });
    socket.on('disconnect', () => setState('offline'));
    socket.on('connect_error', () => setState('offline'));
    socket.on('run:progress', (raw: unknown) => {
      const parsed = runProgressSchema.safeParse(raw);
      if (parsed.success) handlers.current.onProgress?.(parsed.data);
    });
    socket.on('run:state', (raw: unknown) => {
      const parsed = runStateEventSchema.safeParse(raw);
      if (parsed.success) handlers.current.onState?.(parsed.data);
    });
    return () => {
      socketRef.current = null;
      socket.removeAllListeners();
      socket.disconnect();
    };
  }, [enabled, queryClient]);

  const key = rooms.join('|');
  useEffect(() => {
    const next = key ? key.split('|') : [];
    const previous = roomsRef.current;
    roomsRef.current = next;
    const socket = socketRef.current;
    if (!socket?.connected) return;
    for (const room of next) if (!previous.includes(room)) socket.emit('watch', room, () => undefined);
    for (const room of previous) if (!next.includes(room)) socket.emit('unwatch', room);
  }, [key]);

  return state;
}
