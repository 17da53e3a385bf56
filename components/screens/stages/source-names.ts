import type { z } from 'zod';
import type { coupleLegSourceSchema, stageSourceSchema } from '@/shared/api/coolers';
import { useDesigns } from '@/components/api/designs';
import { useFamilies } from '@/components/api/families';
import { useRuns } from '@/components/api/runs';
import { legSourceWords } from '@/components/screens/modules/module-words';
import { runTitle } from '@/components/screens/runs/run-format';

type LegSourceIn = z.input<typeof coupleLegSourceSchema>;
type StageSourceIn = z.input<typeof stageSourceSchema>;

export type SourceNames = { run: (id: string) => string | null; family: (id: string) => string | null; design: (id: string) => string | null; loading: boolean };

/** Names of the runs, families and designs a cooler is built from (a saved setup holds their ids). */
export function useSourceNames(): SourceNames {
  const runs = useRuns();
  const families = useFamilies();
  const designs = useDesigns();
  const runById = new Map((runs.data?.runs ?? []).map((r) => [r.id, runTitle(r)]));
  const familyById = new Map((families.data?.families ?? []).map((f) => [f.id, f.name]));
  const designById = new Map((designs.data?.designs ?? []).map((d) => [d.id, d.name]));
  return {
    run: (id) => runById.get(id) ?? null,
    family: (id) => familyById.get(id) ?? null,
    design: (id) => designById.get(id) ?? null,
    loading: runs.isPending || families.isPending || designs.isPending,
  };
}

/** "Detector p-leg (leg design, profile optimised)" or a fixed leg in the module's words. */
export function coolerLegWords(s: LegSourceIn, names: SourceNames): string {
  if (names.loading) return '…';
  if (s.kind === 'design') return `${names.design(s.designId) ?? 'a deleted design'} (leg design, profile optimised)`;
  if (s.kind === 'run') return legSourceWords({ ...s, leg: s.leg ?? 'optimum' }, names.run(s.runId));
  return legSourceWords(s, names.family(s.familyId));
}

/** A stage's couples in words: both legs, or the matched-couple run they come from. */
export function stageSourceWords(s: StageSourceIn, names: SourceNames): string {
  if (names.loading) return '…';
  if (s.kind === 'couple') return `both legs of ${names.run(s.runId) ?? 'a deleted run'} (matched couple)`;
  return `p: ${coolerLegWords(s.p, names)}; n: ${coolerLegWords(s.n, names)}`;
}
