import type { Action } from '@/components/auth/permissions';

/** A page (by address) a role needs an action for, and what the page holds in words. */
export type PageRule = { pattern: RegExp; requires: Action; what: string; verb: 'see' | 'change' };

const id = '[^/]+';

/**
 * Addresses a role may be refused, most specific first. The actions come
 * from the one permission table (shared/api/permissions.ts), the same the
 * tabs and the API's route table use, so a page is hidden from the role's
 * navigation, explained when reached by address, and refused by the API
 * alike.
 */
export const pageRules: readonly PageRule[] = [
  { pattern: new RegExp(`^/designs/(new|${id}/edit)$`), requires: 'designs.write', what: 'designs', verb: 'change' },
  { pattern: /^\/modules\/new$/, requires: 'designs.write', what: 'modules', verb: 'change' },
  { pattern: new RegExp(`^/materials/(new|upload|${id}/edit)$`), requires: 'families.write', what: 'material families', verb: 'change' },
  { pattern: /^\/(designs|runs|sweeps|modules)(\/|$)/, requires: 'designs.read', what: 'designs, runs and modules', verb: 'see' },
  { pattern: /^\/outbox(\/|$)/, requires: 'outbox.read', what: 'the outbox', verb: 'see' },
  { pattern: /^\/team\/audit(\/|$)/, requires: 'audit.read', what: 'the audit trail', verb: 'see' },
];

/** The first rule the address falls under that the role's `can` refuses, or null when the page is the role's. */
export function refusedRule(pathname: string, can: (action: Action) => boolean): PageRule | null {
  const rule = pageRules.find((r) => r.pattern.test(pathname));
  return rule && !can(rule.requires) ? rule : null;
}
