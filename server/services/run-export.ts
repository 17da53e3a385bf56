import type { DataSource } from 'typeorm';
import { Team } from '../db/entities';
import { HttpError } from '../http/errors';
import { csvComment, csvDocument } from './csv-writer';
import { coolerRunCsv } from './cooler-csv';
import { findRun } from './run-service';

type Profile = { x: number[]; temperature: number[]; seebeck: number[]; sigma: number[]; kappa: number[]; zT: number[]; perCm3?: number[] };

const fmt = (v: number): number => Number(v.toPrecision(7));

/** The converged profile in trade units, one row per point along the leg, with the headline numbers as comments. */
export async function exportRun(ds: DataSource, team: Team, id: unknown, format: 'csv' | 'json'): Promise<{ filename: string; body: string }> {
  const r = await findRun(ds.manager, team, id);
  if (!r.result) throw new HttpError(409, `The run has no result yet (it is ${r.state}).`, [{ field: 'state', message: r.state }], 'Conflict');
  const stem = `run-${r.id.slice(0, 8)}`;
  if (format === 'json') {
    const ran = r.kind === 'leg' ? { design: r.designSnapshot } : { cooler: r.coolerSnapshot };
    return { filename: `${stem}.json`, body: `${JSON.stringify({ runId: r.id, kind: r.kind, state: r.state, engineVersion: r.engineVersion, ...ran, case: r.caseJson, result: r.result }, null, 2)}\n` };
  }
  // A couple or cascade has no one profile: its CSV is its own table (stages and curves, or the couple's figures and legs).
  if (r.kind !== 'leg') return coolerRunCsv(ds, team, r.id, r.kind);
  const res = r.result as { profile: Profile; deltaT: number; current: number; coldSide: number; hotSide: number; heatLoad: number; cop: number };
  const p = res.profile;
  const header = ['x_mm', 'temperature_K', 'n_per_cm3', 'seebeck_uV_per_K', 'sigma_S_per_cm', 'kappa_W_per_m_K', 'zT'];
  const rows = p.x.map((x, i) => [fmt(x * 1e3), fmt(p.temperature[i]!), p.perCm3 ? fmt(p.perCm3[i]!) : null, fmt(p.seebeck[i]! * 1e6), fmt(p.sigma[i]! / 100), fmt(p.kappa[i]!), fmt(p.zT[i]!)]);
  const comments = [
    csvComment(`Frostgrade run ${r.id} (${r.state})`, `engine ${r.engineVersion}`, 'model prediction to verify by measurement'),
    csvComment(`cold side ${fmt(res.coldSide)} K`, `hot side ${fmt(res.hotSide)} K`, `deltaT ${fmt(res.deltaT)} K`, `current ${fmt(res.current)} A`, `heat load ${fmt(res.heatLoad)} W`, `COP ${fmt(res.cop)}`),
  ];
  return { filename: `${stem}.csv`, body: csvDocument({ comments, header, rows }) };
}
