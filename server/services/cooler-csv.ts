import type { DataSource } from 'typeorm';
import { Team } from '../db/entities';
import { HttpError } from '../http/errors';
import { coolerResultOf, type StoredCascadeResult, type StoredCoupleResult } from '../../shared/runs/cooler-results';
import { csvComment, csvDocument, type CsvCell } from './csv-writer';
import { findRun } from './run-service';
import { runName } from './run-summary';

/**
 * A couple or cascade run's result as CSV, in the trade's units (K, A, V, W,
 * mm, mm², A/cm², cm⁻³), units in every header. A file holds more than one
 * table (a cascade's stages, then its heat-load curves): each is a complete
 * csvDocument of its own, with a comment naming it, a blank line between.
 */
const fmt = (v: number | null | undefined): CsvCell => (typeof v === 'number' && Number.isFinite(v) ? Number(v.toPrecision(7)) : null);

type Head = { title: string; state: string; engineVersion: string; name: string };

const intro = (h: Head): string[] => [
  csvComment(`Frostgrade ${h.title} (${h.state})`, h.name, `engine ${h.engineVersion}`, 'model prediction to verify by measurement before building hardware'),
];

function cascadeCsv(h: Head, r: StoredCascadeResult): string {
  const stageHeader = ['stage (1 = coldest)', 'couples', 'cold_side_K', 'hot_side_K', 'current_A', 'voltage_V', 'power_W', 'heat_load_W', 'heat_rejected_W'];
  const rows: CsvCell[][] = r.stages.map((s, i) => [i + 1, s.couples, fmt(s.coldSide), fmt(s.hotSide), fmt(s.current), fmt(s.voltage), fmt(s.power), fmt(s.heatLoad), fmt(s.heatRejected)]);
  const last = r.stages[r.stages.length - 1];
  // The supply's voltage is the stages' sum only when they are in series on one supply; separate supplies have no one voltage.
  const voltage = r.wiring === 'series' ? r.stages.reduce((a, s) => a + s.voltage, 0) : null;
  rows.push(['total', r.stages.reduce((a, s) => a + s.couples, 0), fmt(r.coldSide), fmt(last?.hotSide), r.wiring === 'series' ? fmt(r.stages[0]?.current) : null, fmt(voltage), fmt(r.power), fmt(r.heatLoad), fmt(last?.heatRejected)]);
  const stages = csvDocument({
    comments: [
      ...intro(h),
      csvComment(`hot side ${fmt(r.hotSide)} K`, `cold side ${fmt(r.coldSide)} K`, `deltaT ${fmt(r.deltaT)} K`, `heat load ${fmt(r.heatLoad)} W`, `input power ${fmt(r.power)} W`, `COP ${fmt(r.cop) ?? 'none'}`),
      csvComment(`objective ${r.objective}`, `wiring ${r.wiring}`, `${r.stages.length} stages`),
    ],
    header: stageHeader,
    rows,
  });
  const curves = csvDocument({
    comments: [csvComment('heat load against cold-side temperature at the best currents; the cascade and with its coldest stages removed')],
    header: ['stages', 'cold_side_K', 'heat_load_W', 'power_W'],
    rows: r.curves.flatMap((c) => c.points.map((p) => [c.stages, fmt(p.coldSide), fmt(p.heatLoad), fmt(p.power)])),
  });
  return `${stages}\n${curves}`;
}

function coupleCsv(h: Head, r: StoredCoupleResult): string {
  const unit = r.mismatch.unit === '' ? 'COP' : r.mismatch.unit;
  const figures = csvDocument({
    comments: [...intro(h), csvComment(`objective ${r.objective.kind}`, 'heat load is per couple')],
    header: ['hot_side_K', 'cold_side_K', 'deltaT_K', 'heat_load_W', 'current_A', 'voltage_V', 'power_W', 'COP', 'area_ratio_n_over_p', `separately_powered_objective_${unit}`, `mismatch_cost_${unit}`],
    rows: [[fmt(r.hotSide), fmt(r.coldSide), fmt(r.deltaT), fmt(r.heatLoad), fmt(r.current), fmt(r.voltage), fmt(r.power), fmt(r.cop), fmt(r.areaRatio), fmt(r.mismatch.separateObjective), fmt(r.mismatch.cost)]],
  });
  const legs = (['p', 'n'] as const).map((side) => ({ side, leg: r[side] }));
  const legTable = csvDocument({
    comments: [csvComment('each leg: the shared current density against its own best (how far from matched it runs)')],
    header: ['leg', 'length_mm', 'area_mm2', 'profile_optimised', 'current_density_A_per_cm2', 'own_best_current_density_A_per_cm2'],
    // A/m² → A/cm²: 1e-4.
    rows: legs.map(({ side, leg }) => [side, fmt(leg.length * 1e3), fmt(leg.area * 1e6), leg.optimised ? 'yes' : 'no', fmt(leg.currentDensity * 1e-4), fmt(leg.ownCurrentDensity * 1e-4)]),
  });
  const profiles = csvDocument({
    comments: [csvComment('doping profiles from the cold end (legs of constant or segmented material have none)')],
    header: ['leg', 'x_mm', 'n_per_cm3'],
    rows: legs.flatMap(({ side, leg }) => (leg.doping ? leg.doping.x.map((x, i) => [side, fmt(x * leg.length * 1e3), fmt(leg.doping!.perCm3[i])]) : [])),
  });
  return `${figures}\n${legTable}\n${profiles}`;
}

/** `GET /api/runs/:id/cascade.csv` and `couple.csv`: 409 for a run of another kind or without a result. */
export async function coolerRunCsv(ds: DataSource, team: Team, id: unknown, kind: 'couple' | 'cascade'): Promise<{ filename: string; body: string }> {
  const r = await findRun(ds.manager, team, id);
  if (r.kind !== kind) {
    const other = r.kind === 'leg' ? 'export.csv' : `${r.kind}.csv`;
    throw new HttpError(409, `Run ${r.number} is a ${r.kind} run: its CSV is ${other}.`, [{ field: 'kind', message: `a ${r.kind} run, not a ${kind} run` }], 'Conflict');
  }
  const parsed = coolerResultOf(r.kind, r.result);
  if (!parsed) throw new HttpError(409, `The run has no result yet (it is ${r.state}).`, [{ field: 'state', message: r.state }], 'Conflict');
  const h: Head = { title: `${kind} run ${r.number}`, state: r.state, engineVersion: r.engineVersion, name: runName(r) };
  const body = parsed.kind === 'cascade' ? cascadeCsv(h, parsed.result) : coupleCsv(h, parsed.result);
  return { filename: `run-${r.number}-${kind}.csv`, body };
}
