import type { ReactNode } from 'react';
import { Stack } from 'expo-router';
import { RoleGate } from '@/components/shell/role-gate';
import { colors } from '@/components/theme';

const screenOptions = { headerShown: false, contentStyle: { backgroundColor: colors.background } };

/**
 * The Designs, Runs and Team tabs are stacks (list, then a design, a run,
 * a sweep, a comparison; the team, its audit trail, your account). Each
 * screen draws its own header with a back link.
 */
export function SectionStack() {
  return <Stack screenOptions={screenOptions} screenLayout={gated} />;
}

/** Each page of the stack explains itself to a role that may not use it (components/shell/page-rules.ts). */
function gated({ children }: { children: ReactNode }) {
  return <RoleGate layer="stack">{children}</RoleGate>;
}
