import type { DataSource } from 'typeorm';
import { familyFromMaterial, propertiesAt, type MaterialInput } from '../../shared/engine';
import { exportHeaders } from '../../shared/families/csv-columns';
import { Team } from '../db/entities';
import { csvComment, csvDocument } from './csv-writer';
import { findFamily, findVersion } from './family-store';

/** Grid on which a model family is sampled for CSV export: 1e18–1e21 cm⁻³, 4 per decade; 200–400 K. */
const sampleDopings = Array.from({ length: 13 }, (_, k) => 10 ** (18 + k / 4));
const sampleTemperatures = [200, 225, 250, 275, 300, 325, 350, 375, 400];

type Row = { perCm3: number; temperature: number; seebeck: number; sigma: number; kappa: number };

function modelRows(definition: MaterialInput): Row[] {
  const family = familyFromMaterial(definition);
  return sampleDopings.flatMap((n) => sampleTemperatures.map((t) => ({ perCm3: n, temperature: t, ...propertiesAt(family, n, t) })));
}

const fmt = (v: number): number => Number(v.toPrecision(8));

/** The upload format with units in the header, so an export can be uploaded again unchanged. */
function toCsv(rows: Row[], comments: string[]): string {
  return csvDocument({
    comments,
    header: [exportHeaders.perCm3, exportHeaders.temperature, exportHeaders.seebeck, exportHeaders.sigma, exportHeaders.kappa],
    rows: rows.map((r) => [fmt(r.perCm3), fmt(r.temperature), fmt(r.seebeck * 1e6), fmt(r.sigma / 100), fmt(r.kappa)]),
  });
}

export async function exportFamily(ds: DataSource, team: Team, id: unknown, format: 'csv' | 'json', version?: number): Promise<{ filename: string; body: string }> {
  const f = await findFamily(ds.manager, team, id);
  const v = await findVersion(ds.manager, f, version);
  const definition = v.definition as MaterialInput;
  const stem = `${f.name.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-|-$/g, '') || 'family'}-v${v.version}`;
  if (format === 'json') {
    // `material` is exactly what a leg case file takes under that key.
    const body = JSON.stringify({ name: f.name, version: v.version, carrier: f.carrier, source: v.source, summary: v.summary, material: definition }, null, 2);
    return { filename: `${stem}.json`, body: `${body}\n` };
  }
  const rows = definition.kind === 'table' ? definition.rows : modelRows(definition);
  const comments = [
    csvComment('family', f.name, `version ${v.version} (${f.kind === 'table' ? 'measured points' : `${f.kind} model sampled on a grid`})`),
    csvComment('source', v.source),
  ];
  return { filename: `${stem}.csv`, body: toCsv(rows, comments) };
}
