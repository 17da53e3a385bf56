import type { FamilySummary } from '@/shared/api/families';
import { byRecentUse, familiesOffered, familyChoices } from './family-choice-model';

const family = (i: number, o: Partial<FamilySummary> = {}): FamilySummary => ({
  id: `00000000-0000-4000-8000-${String(i).padStart(12, '0')}`,
  name: `Family ${i}`,
  kind: 'band',
  carrier: 'p',
  summary: '',
  source: '',
  createdBy: 'Piet',
  createdAt: '2026-01-01T00:00:00.000Z',
  isDemo: false,
  version: 1,
  archived: false,
  updatedAt: `2026-01-${String(i).padStart(2, '0')}T00:00:00.000Z`,
  ...o,
});

describe('family choices', () => {
  it('puts the most recently used or changed families first', () => {
    const families = [family(1), family(2), family(3)];
    expect(byRecentUse(families, []).map((f) => f.name)).toEqual(['Family 3', 'Family 2', 'Family 1']);
    // A design made of family 1 yesterday brings it to the front.
    expect(byRecentUse(families, [{ familyId: families[0].id, updatedAt: '2026-02-01T00:00:00.000Z' }]).map((f) => f.name)).toEqual(['Family 1', 'Family 3', 'Family 2']);
  });

  it('offers a few families, keeps the chosen one, and says how many more there are', () => {
    const many = byRecentUse(Array.from({ length: 20 }, (_, i) => family(i + 1)), []);
    const oldest = many[many.length - 1];
    const first = familyChoices(many, { search: '', showAll: false, showArchived: false, chosenId: oldest.id });
    expect(first.shown).toHaveLength(familiesOffered + 1);
    expect(first.shown[0]).toBe(oldest);
    expect(first.more).toBe(20 - familiesOffered - 1);
    expect(familyChoices(many, { search: '', showAll: true, showArchived: false, chosenId: '' })).toEqual({ shown: many, more: 0 });
  });

  it('hides archived families unless asked, and searches name, summary and source', () => {
    const families = [family(1, { name: 'NL-P7 (Bi,Sb)2Te3' }), family(2, { name: 'UX test 17', archived: true }), family(3, { name: 'Other', summary: 'Telluride from NL-P7 batch' })];
    expect(familyChoices(families, { search: '', showAll: false, showArchived: false, chosenId: '' }).shown.map((f) => f.name)).toEqual(['NL-P7 (Bi,Sb)2Te3', 'Other']);
    expect(familyChoices(families, { search: '', showAll: false, showArchived: true, chosenId: '' }).shown.map((f) => f.name)).toEqual(['NL-P7 (Bi,Sb)2Te3', 'Other', 'UX test 17']);
    expect(familyChoices(families, { search: 'nl-p7', showAll: false, showArchived: false, chosenId: '' }).shown.map((f) => f.name)).toEqual(['NL-P7 (Bi,Sb)2Te3', 'Other']);
    expect(familyChoices(families, { search: 'ux', showAll: false, showArchived: false, chosenId: '' })).toEqual({ shown: [], more: 0 });
  });
});
