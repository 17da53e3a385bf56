import { useState } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { createQueryClient } from '@/components/api/query-client';
import { AuthGate } from '@/components/auth/auth-gate';
import { appFonts } from '@/components/fonts';

/**
 * Providers and one-time setup only (fonts, the session check); screens
 * live in `components/screens` and `components/auth`.
 */
export default function RootLayout() {
  const [queryClient] = useState(createQueryClient);
  const [fontsLoaded, fontError] = useFonts(appFonts);
  // Render with fallback fonts rather than a blank page if a font fails.
  if (!fontsLoaded && !fontError) return null;
  return (
    <SafeAreaProvider>
      <QueryClientProvider client={queryClient}>
        <StatusBar style="light" />
        <AuthGate>
          <Slot />
        </AuthGate>
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}
