import type { ReactNode } from 'react';
import { usePathname } from 'expo-router';
import { roleLabels } from '@/components/auth/permissions';
import { useRole, useSession } from '@/components/auth/session';
import { LinkButton } from '@/components/ui/link-button';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { homeFor } from './home';
import { refusedRule, type PageRule } from './page-rules';
import { ScreenFrame } from './screen-frame';

/** "Your role, viewer, cannot see the outbox; ask an admin of Northlight Sensors." */
export function refusalText(role: string, rule: PageRule, teamName: string): string {
  return `Your role, ${role}, cannot ${rule.verb} ${rule.what}; ask an admin of ${teamName} if you need to.`;
}

/**
 * Renders the page, or, when the signed-in role may not use the address
 * (typed or followed from a link), says why in words instead of letting
 * the page meet the API's "Forbidden" with a "Try again" that cannot help.
 */
export function RoleGate({ layer, children }: { layer: PageRule['layer']; children: ReactNode }) {
  const pathname = usePathname();
  const session = useSession();
  const { can, role } = useRole();
  const rule = refusedRule(pathname, can, layer);
  if (!rule || !role || !session) return <>{children}</>;
  return (
    <ScreenFrame title="Not for your role">
      <Notice tone="info" title="Not available to your role" testID="role-refusal">
        <AppText>{refusalText(roleLabels[role].toLowerCase(), rule, session.team.name)}</AppText>
      </Notice>
      <LinkButton variant="quiet" label="Go to your start page" href={homeFor(role)} testID="role-refusal-home" />
    </ScreenFrame>
  );
}
