import type { ReactElement, ReactNode } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { configure, render, type RenderOptions } from '@testing-library/react-native';
import { SafeAreaProvider } from 'react-native-safe-area-context';

// The first render of a suite can take over a second on a busy 2-core machine.
configure({ asyncUtilTimeout: 5_000 });

const safeAreaMetrics = {
  frame: { x: 0, y: 0, width: 390, height: 844 },
  insets: { top: 0, left: 0, right: 0, bottom: 0 },
};

/** A fresh client per test: no retries, no cache shared between tests. */
export function createTestQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: { queries: { retry: false, gcTime: Infinity, refetchInterval: false } },
  });
}

export function renderWithProviders(ui: ReactElement, options?: RenderOptions) {
  const queryClient = createTestQueryClient();
  const wrapper = ({ children }: { children: ReactNode }) => (
    <SafeAreaProvider initialMetrics={safeAreaMetrics}>
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </SafeAreaProvider>
  );
  return { queryClient, ...render(ui, { wrapper, ...options }) };
}

export type FakeReply = { status: number; body: unknown };

/**
 * Replaces global `fetch` with a queue of replies (the last one repeats)
 * and records the requested URLs.
 */
export function mockFetch(...replies: FakeReply[]) {
  const calls: string[] = [];
  const fake = jest.fn(async (input: unknown) => {
    calls.push(String(input));
    const reply = replies[Math.min(calls.length - 1, replies.length - 1)];
    return {
      ok: reply.status >= 200 && reply.status < 300,
      status: reply.status,
      text: async () => (typeof reply.body === 'string' ? reply.body : JSON.stringify(reply.body)),
    };
  });
  global.fetch = fake as unknown as typeof fetch;
  return { calls, fake };
}
