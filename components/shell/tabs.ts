import type { Href } from 'expo-router';
import type { UseTabsWithTriggersOptions } from 'expo-router/ui';
import type { Action } from '@/components/auth/permissions';
import type { TabIconName } from './tab-icon';

export type TabSpec = {
  /** Route name inside `app/(tabs)/` (file name without extension). */
  name: string;
  href: Href;
  label: string;
  icon: TabIconName;
  /** Shown only to members whose role may take this action (see `useVisibleTabs`). */
  requires?: Action;
};

/**
 * The app's top-level destinations, in display order. Adding a tab is one
 * line here plus its one-line route file in `app/(tabs)/`.
 */
export const tabs: readonly TabSpec[] = [
  { name: '(materials)', href: '/materials', label: 'Materials', icon: 'materials' },
  { name: '(designs)', href: '/designs', label: 'Designs', icon: 'designs', requires: 'designs.read' },
  { name: '(runs)', href: '/runs', label: 'Runs', icon: 'runs', requires: 'designs.read' },
  { name: '(growth)', href: '/growth', label: 'Growth', icon: 'growth' },
  { name: '(team)', href: '/team', label: 'Team', icon: 'team' },
  { name: 'outbox', href: '/outbox', label: 'Outbox', icon: 'outbox', requires: 'outbox.read' },
  { name: 'system', href: '/system', label: 'System', icon: 'system' },
];

type ScreenTrigger = UseTabsWithTriggersOptions['triggers'][number];

export const tabTriggers: ScreenTrigger[] = tabs.map((tab) => ({
  type: 'internal',
  name: tab.name,
  href: tab.href,
}));
