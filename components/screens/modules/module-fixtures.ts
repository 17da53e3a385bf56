import type { ModuleDesign, ModuleSummary } from '@/shared/api/modules';
import { legsFromRun } from '@/shared/engine';
import { parseRunResult } from '@/components/screens/runs/run-result';
import { ids, pBand, runDetail } from '@/components/screens/runs/test-fixtures';
import { resultLegs } from '@/components/screens/curves/curve-model';

/** An engine module case: the fixture run's optimum p leg with an n leg of the same band model at 2e19 cm⁻³. */
export function moduleCase(extra: Record<string, unknown> = {}): Record<string, unknown> {
  const detail = runDetail('succeeded', { result: true });
  const parsed = parseRunResult(detail.result);
  if (!parsed?.ok) throw new Error('the fixture result does not parse');
  const legs = legsFromRun(detail.case, resultLegs(parsed.result));
  return { hotSide: 300, deltaT: 20, p: legs.optimum, n: { length: 1.5e-3, area: 1e-6, material: { ...pBand, carrier: 'n' }, doping: 2e19 }, couples: 4, points: 12, deltaTPoints: 5, tradeCouples: [1, 4, 8], ...extra };
}

export const familyIdN = '55555555-5555-4555-8555-555555555555';

/** A saved module as the API returns it, its case built by `moduleCase`. */
export function moduleDesign(id: string, name: string, couples: number, extra: Record<string, unknown> = {}): ModuleDesign {
  return {
    id,
    name,
    notes: '',
    input: {
      name,
      notes: '',
      p: { kind: 'run', runId: ids.run, leg: 'optimum' },
      n: { kind: 'family', familyId: familyIdN, perCm3: 2e19, lengthMm: 1.5, areaMm2: 1 },
      hotSide: 300,
      deltaT: 20,
      couples,
      ...extra,
    },
    case: moduleCase({ couples, ...extra }),
    createdBy: 'Piet',
    createdAt: '2026-02-01T10:00:00.000Z',
    updatedAt: '2026-02-01T11:00:00.000Z',
  };
}

/** The list entry of a saved module. */
export function moduleSummary(m: ModuleDesign): ModuleSummary {
  const { case: _case, ...rest } = m;
  return { ...rest, sourceNames: { p: 'Stage-2 leg', n: 'NL-N3 n-type band model' } };
}
