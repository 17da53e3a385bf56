import type { ComponentType, ReactNode } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { renderRouter } from 'expo-router/testing-library';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { SessionProvider, type Session } from '@/components/auth/session';
import { createTestQueryClient } from '@/components/test-utils';

const safeAreaMetrics = {
  frame: { x: 0, y: 0, width: 390, height: 844 },
  insets: { top: 0, left: 0, right: 0, bottom: 0 },
};

export type RouteTable = Record<string, ComponentType>;

/**
 * Renders real routes (expo-router's in-memory router) with the app's
 * providers, starting at `url`, so links and navigation are exercised too.
 * `result.getPathname()` tells where the app went.
 */
export function renderRoutes(routes: RouteTable, url: string, session: Session = null) {
  const queryClient = createTestQueryClient();
  const wrapper = ({ children }: { children: ReactNode }) => (
    <SafeAreaProvider initialMetrics={safeAreaMetrics}>
      <QueryClientProvider client={queryClient}>
        <SessionProvider session={session}>{children}</SessionProvider>
      </QueryClientProvider>
    </SafeAreaProvider>
  );
  return { queryClient, ...renderRouter(routes, { initialUrl: url, wrapper }) };
}
