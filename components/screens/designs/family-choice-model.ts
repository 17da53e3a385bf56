import type { FamilySummary } from '@/shared/api/families';

/** How many families a picker offers before "Show all": enough for a lab's working set, not a wall of test leftovers. */
export const familiesOffered = 8;

/** Most recently used or changed first: a family's own last edit, or the last edit of a design made of it. */
export function byRecentUse(families: readonly FamilySummary[], designs: readonly { familyId: string; updatedAt: string }[]): FamilySummary[] {
  const used = new Map<string, string>();
  for (const d of designs) if ((used.get(d.familyId) ?? '') < d.updatedAt) used.set(d.familyId, d.updatedAt);
  const last = (f: FamilySummary) => {
    const u = used.get(f.id);
    return u && u > f.updatedAt ? u : f.updatedAt;
  };
  return [...families].sort((a, b) => last(b).localeCompare(last(a)) || a.name.localeCompare(b.name));
}

export type FamilyChoices = {
  /** The families to show as chips, the chosen one always among them. */
  shown: FamilySummary[];
  /** How many matching families "Show all" would add. */
  more: number;
};

/**
 * What a picker shows: active families, most recently used first; archived
 * ones only when asked for (after the active ones); filtered by a search
 * text on name, summary and source; at most `familiesOffered` unless
 * `showAll`. The chosen family is never hidden.
 */
export function familyChoices(
  ordered: readonly FamilySummary[],
  o: { search: string; showAll: boolean; showArchived: boolean; chosenId: string },
): FamilyChoices {
  const words = o.search.trim().toLowerCase().split(/\s+/).filter(Boolean);
  const matches = (f: FamilySummary) => words.every((w) => `${f.name} ${f.summary} ${f.source}`.toLowerCase().includes(w));
  const listed = [...ordered.filter((f) => !f.archived), ...(o.showArchived ? ordered.filter((f) => f.archived) : [])].filter(matches);
  const shown = o.showAll ? listed : listed.slice(0, familiesOffered);
  const chosen = ordered.find((f) => f.id === o.chosenId);
  if (chosen && !shown.includes(chosen)) shown.unshift(chosen);
  return { shown, more: listed.length - shown.filter((f) => listed.includes(f)).length };
}
