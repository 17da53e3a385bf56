import type { ReactElement, ReactNode } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { configure, render, type RenderOptions } from '@testing-library/react-native';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import type { MeResponse, Role } from '@/shared/api/auth';
import { SessionProvider, type Session } from '@/components/auth/session';

// The first render of a suite can take over a second on a busy 2-core machine.
configure({ asyncUtilTimeout: 5_000 });

const safeAreaMetrics = {
  frame: { x: 0, y: 0, width: 390, height: 844 },
  insets: { top: 0, left: 0, right: 0, bottom: 0 },
};

/** A fresh client per test: no retries, no cache shared between tests. */
export function createTestQueryClient(): QueryClient {
  return new QueryClient({
    // gcTime Infinity schedules no clean-up timers, so jest exits as soon as the tests end.
    defaultOptions: {
      queries: { retry: false, gcTime: Infinity, refetchInterval: false },
      mutations: { gcTime: Infinity },
    },
  });
}

/** A signed-in member of the demo lab with this role (for `renderWithProviders`' `session`). */
export function sessionAs(role: Role, name = 'Ada Lovelace'): MeResponse {
  return {
    user: { id: `user-${role}`, email: `${role}@northlight.example`, displayName: name, role },
    team: { id: '00000000-0000-4000-8000-000000000001', name: 'Northlight Sensors — detector cooling group' },
  };
}

export type ProviderOptions = RenderOptions & {
  /** Who is signed in (what `useSession`/`useRole` see); nobody by default. */
  session?: Session;
};

export function renderWithProviders(ui: ReactElement, options: ProviderOptions = {}) {
  const { session = null, ...renderOptions } = options;
  const queryClient = createTestQueryClient();
  const wrapper = ({ children }: { children: ReactNode }) => (
    <SafeAreaProvider initialMetrics={safeAreaMetrics}>
      <QueryClientProvider client={queryClient}>
        <SessionProvider session={session}>{children}</SessionProvider>
      </QueryClientProvider>
    </SafeAreaProvider>
  );
  return { queryClient, ...render(ui, { wrapper, ...renderOptions }) };
}

export type FakeReply = { status: number; body: unknown };

export type SentRequest = { url: string; method: string; body: unknown };

/**
 * Replaces global `fetch` with a queue of replies (the last one repeats)
 * and records the requested URLs (`calls`) and, with method and JSON body,
 * every request (`requests`).
 */
export function mockFetch(...replies: FakeReply[]) {
  const calls: string[] = [];
  const requests: SentRequest[] = [];
  const fake = jest.fn(async (input: unknown, init?: RequestInit) => {
    calls.push(String(input));
    const body = typeof init?.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined;
    requests.push({ url: String(input), method: init?.method ?? 'GET', body });
    const reply = replies[Math.min(calls.length - 1, replies.length - 1)];
    return {
      ok: reply.status >= 200 && reply.status < 300,
      status: reply.status,
      text: async () => (typeof reply.body === 'string' ? reply.body : JSON.stringify(reply.body)),
    };
  });
  global.fetch = fake as unknown as typeof fetch;
  return { calls, requests, fake };
}
