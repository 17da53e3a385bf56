import { useRole } from '@/components/auth/session';
import { tabs, type TabSpec } from './tabs';

/** The tabs the signed-in member's role may use (Outbox only for admins; Designs and Runs not for growers). */
export function useVisibleTabs(): readonly TabSpec[] {
  const { can } = useRole();
  return tabs.filter((tab) => tab.requires === undefined || can(tab.requires));
}
