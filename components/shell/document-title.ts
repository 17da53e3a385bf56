import { useContext, useEffect } from 'react';
import { NavigationContext, NavigationRouteContext } from 'expo-router/react-navigation';

export const appName = 'Frostgrade';

/**
 * The part of the app a route belongs to, by the first segment of its route
 * name inside its section's stack ("runs/[id]" → Runs): the middle of a tab
 * title, so tabs, history and bookmarks read "Run 12 · Runs · Frostgrade".
 */
const sections: Record<string, string> = {
  index: 'Materials', materials: 'Materials', designs: 'Designs', runs: 'Runs', sweeps: 'Runs', modules: 'Modules', stages: 'Stages',
  growth: 'Growth', team: 'Team', account: 'Team', outbox: 'Outbox', system: 'System',
};

export function sectionOfRoute(routeName: string | undefined): string | null {
  if (!routeName) return null;
  return sections[routeName.split('/')[0] ?? ''] ?? null;
}

/** "Run 12 · Runs · Frostgrade"; a page named like its section says it once ("Runs · Frostgrade"). */
export function documentTitle(page: string, section: string | null = null): string {
  const parts = [page.trim(), section, appName].filter((p): p is string => Boolean(p));
  return parts.filter((p, i) => p !== parts[i - 1]).join(' · ');
}

/**
 * Names the browser tab after the page. Set when the screen gains focus (a
 * stack keeps the screens below it mounted, so mounting alone would leave the
 * title of the page on top after going back), and at once outside a navigator.
 */
export function useDocumentTitle(page: string, section?: string | null): void {
  const navigation = useContext(NavigationContext);
  const route = useContext(NavigationRouteContext);
  const title = documentTitle(page, section === undefined ? sectionOfRoute(route?.name) : section);
  useEffect(() => {
    if (typeof document === 'undefined') return undefined;
    const set = () => {
      document.title = title;
    };
    if (!navigation) {
      set();
      return undefined;
    }
    if (navigation.isFocused()) set();
    return navigation.addListener('focus', set);
  }, [navigation, title]);
}
