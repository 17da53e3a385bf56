import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { cascadeInputSchema, CouplesLimit, coupleInputSchema, CoupleLegSource, StageSource } from '../../shared/api';
import type { LegDefinitionInput, MaterialInput } from '../../shared/engine';
import { designToCase } from '../../shared/runs/design-case';
import { MaterialFamilyVersion, Team } from '../db/entities';
import { ValidationError } from '../http/errors';
import { coolerResultOf } from '../../shared/runs/cooler-results';
import { findDesign } from './design-service';
import { resolveLeg } from './module-service';
import { findRun } from './run-service';

/**
 * A cooler's sources resolved into the engine's case (the `couple` /
 * `cascade` command's case, SI: m, m², K, W, K/W), against the caller's team
 * only. Errors name the input's field (`p.designId`, `stages[1].source.runId`).
 */
export type CoupleInputOut = z.output<typeof coupleInputSchema>;
export type CascadeInputOut = z.output<typeof cascadeInputSchema>;
export type CoolerInputOut = CoupleInputOut | CascadeInputOut;

/** A couple's leg: a leg design becomes a leg the engine optimises within its family, bounds, control points and monotone setting. */
async function coupleLeg(m: EntityManager, team: Team, s: CoupleLegSource, field: string): Promise<Record<string, unknown>> {
  if (s.kind !== 'design') return resolveLeg(m, team, s, field);
  const design = await findDesign(m, team, s.designId).catch(() => { throw new ValidationError([{ field: `${field}.designId`, message: 'no such leg design in this team' }]); });
  const version = await m.getRepository(MaterialFamilyVersion).findOneByOrFail({ familyId: design.familyId, version: design.familyVersion });
  // The design's own optimize case, without its conditions and objective: the couple sets those for both legs.
  const { hotSide: _h, objective: _o, coldSide: _c, heatLoad: _q, ...leg } = designToCase(design, version.definition as MaterialInput);
  return leg;
}

/** Conditions as the leg cases take them: ΔT objectives carry the load; heat-load objectives the cold side; COP both. */
function conditions(input: { objective: string; heatLoad: number; coldSide?: number }): Record<string, number> {
  if (input.objective === 'maxDeltaT') return { heatLoad: input.heatLoad };
  if (input.objective === 'maxHeatLoad') return { coldSide: input.coldSide as number };
  return { coldSide: input.coldSide as number, heatLoad: input.heatLoad };
}

export async function coupleCase(m: EntityManager, team: Team, input: CoupleInputOut): Promise<Record<string, unknown>> {
  const p = await coupleLeg(m, team, input.p, 'p');
  const n = await coupleLeg(m, team, input.n, 'n');
  const c = {
    hotSide: input.hotSide,
    ...conditions(input),
    p,
    // A given ratio sets the n leg's area from the p leg's (the engine refuses both); a free ratio splits the two legs' total.
    ...(input.areaRatio !== undefined ? { n: { ...n, area: undefined }, areaRatio: input.areaRatio } : { n }),
    objective: input.objective,
  };
  return JSON.parse(JSON.stringify(c)) as Record<string, unknown>;
}

/** Both legs of a finished matched-couple run of the team, as the engine returned them. */
async function coupleRunLegs(m: EntityManager, team: Team, runId: string, field: string): Promise<{ p: LegDefinitionInput; n: LegDefinitionInput }> {
  const run = await findRun(m, team, runId).catch(() => { throw new ValidationError([{ field, message: 'no such run in this team' }]); });
  if (run.kind !== 'couple') throw new ValidationError([{ field, message: `the run is a ${run.kind} run; a stage takes both legs of a matched-couple run` }]);
  const parsed = coolerResultOf(run.kind, run.result);
  if (!parsed || parsed.kind !== 'couple') throw new ValidationError([{ field, message: `the run has no result (it is ${run.state})` }]);
  return { p: parsed.result.p.leg as LegDefinitionInput, n: parsed.result.n.leg as LegDefinitionInput };
}

async function stageLegs(m: EntityManager, team: Team, s: StageSource, field: string): Promise<{ p: LegDefinitionInput; n: LegDefinitionInput }> {
  if (s.kind === 'couple') return coupleRunLegs(m, team, s.runId, `${field}.runId`);
  return { p: await resolveLeg(m, team, s.p, `${field}.p`), n: await resolveLeg(m, team, s.n, `${field}.n`) };
}

/** The couples limit in the engine's terms: a total count, or the base area in m² (the input is in mm²). */
function optimizeCouples(limit: CouplesLimit | null): Record<string, unknown> {
  if (!limit) return {};
  return { optimizeCouples: limit.kind === 'total' ? { total: limit.total } : { baseArea: limit.baseAreaMm2 * 1e-6 } };
}

export async function cascadeCase(m: EntityManager, team: Team, input: CascadeInputOut): Promise<Record<string, unknown>> {
  const stages = [];
  for (const [i, s] of input.stages.entries()) {
    const legs = await stageLegs(m, team, s.source, `stages[${i}].source`);
    stages.push({ couples: s.couples, p: legs.p, n: legs.n, interfaceResistance: s.interfaceResistance });
  }
  const c = {
    hotSide: input.hotSide,
    heatLoad: input.heatLoad,
    ...(input.objective === 'minPower' ? { coldSide: input.coldSide } : {}),
    stages,
    wiring: input.wiring,
    objective: input.objective,
    ...optimizeCouples(input.couplesLimit),
  };
  return JSON.parse(JSON.stringify(c)) as Record<string, unknown>;
}

export async function coolerCase(m: EntityManager, team: Team, input: CoolerInputOut): Promise<Record<string, unknown>> {
  return input.kind === 'couple' ? coupleCase(m, team, input) : cascadeCase(m, team, input);
}

/**
 * An engine refusal's field (a case path: `stages[1].p.doping`,
 * `optimizeCouples.total`) as the input's field, so the error lands beside
 * what the user set.
 */
export function engineFieldToInput(input: CoolerInputOut, field: string): string {
  if (input.kind === 'couple') {
    const side = /^(p|n)\b/.exec(field)?.[1];
    if (side) return input[side as 'p' | 'n'].kind === 'design' ? `${side}.designId` : side;
    return field;
  }
  const stage = /^stages\[(\d+)\](?:\.(\w+))?/.exec(field);
  if (stage) {
    const [, i, key] = stage;
    if (key === 'couples' || key === 'interfaceResistance') return `stages[${i}].${key}`;
    if (key === 'p' || key === 'n') return input.stages[Number(i)]?.source.kind === 'legs' ? `stages[${i}].source.${key}` : `stages[${i}].source`;
    return `stages[${i}]`;
  }
  if (field.startsWith('optimizeCouples')) return 'couplesLimit';
  return field;
}
