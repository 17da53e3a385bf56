import type { Action } from '@/components/auth/permissions';

/** A page (by address) a role needs an action for, and what the page holds in words. */
export type PageRule = {
  pattern: RegExp;
  requires: Action;
  what: string;
  verb: 'see' | 'change';
  /**
   * Which layout explains the refusal: a page inside a tab's stack is
   * refused by the stack (the stack must stay mounted, or the tab forgets
   * the address and falls back to "/"); a tab that is a single page is
   * refused by the shell.
   */
  layer: 'tabs' | 'stack';
};

const id = '[^/]+';

/**
 * Addresses a role may be refused, most specific first. The actions come
 * from the one permission table (shared/api/permissions.ts), the same the
 * tabs and the API's route table use, so a page is hidden from the role's
 * navigation, explained when reached by address, and refused by the API
 * alike.
 */
export const pageRules: readonly PageRule[] = [
  { pattern: new RegExp(`^/designs/(new|${id}/edit)$`), requires: 'designs.write', what: 'designs', verb: 'change', layer: 'stack' },
  { pattern: /^\/modules\/new$/, requires: 'designs.write', what: 'modules', verb: 'change', layer: 'stack' },
  { pattern: new RegExp(`^/stages/(new-cascade|new-couple|${id}/edit)$`), requires: 'designs.write', what: 'cascades and matched couples', verb: 'change', layer: 'stack' },
  { pattern: /^\/(designs|runs|sweeps|modules|stages)(\/|$)/, requires: 'designs.read', what: 'designs, runs and modules', verb: 'see', layer: 'stack' },
  { pattern: /^\/outbox(\/|$)/, requires: 'outbox.read', what: 'the outbox', verb: 'see', layer: 'tabs' },
  { pattern: /^\/team\/audit(\/|$)/, requires: 'audit.read', what: 'the audit trail', verb: 'see', layer: 'stack' },
];

/** The first rule the address falls under that the role's `can` refuses, or null when the page is the role's. */
export function refusedRule(pathname: string, can: (action: Action) => boolean, layer: PageRule['layer']): PageRule | null {
  const rule = pageRules.find((r) => r.pattern.test(pathname));
  return rule && rule.layer === layer && !can(rule.requires) ? rule : null;
}
