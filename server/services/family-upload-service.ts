import type { DataSource } from 'typeorm';
import type { UploadPreview, UploadSaved } from '../../shared/api';
import { parseTableCsv } from '../../shared/families/parse-table-csv';
import { Team } from '../db/entities';
import { ValidationError } from '../http/errors';
import { announceFamily, insertFamily } from './family-service';
import { findVersion, summarise } from './family-store';

/** Decodes an uploaded file as UTF-8 text, refusing binaries instead of parsing noise. */
export function uploadText(buffer: Buffer): string {
  if (buffer.includes(0)) throw new ValidationError([{ field: 'file', message: 'the file is not text (it contains NUL bytes); upload a CSV file' }]);
  return buffer.toString('utf8');
}

export function previewUpload(buffer: Buffer): UploadPreview {
  return parseTableCsv(uploadText(buffer));
}

/** All or nothing: an upload with any error saves nothing and answers with every error located. */
export async function saveUpload(ds: DataSource, team: Team, buffer: Buffer, meta: { name: string; source: string; summary: string }, by: string): Promise<UploadSaved> {
  const preview = previewUpload(buffer);
  if (!preview.ok) {
    throw new ValidationError(preview.errors.map((e) => ({
      field: ['file', e.line ? `line ${e.line}` : '', e.column ?? ''].filter(Boolean).join(':'),
      message: e.message,
    })));
  }
  const definition = { kind: 'table' as const, rows: preview.rows.map(({ line: _line, ...r }) => r) };
  const saved = await ds.transaction(async (m) => {
    const f = await insertFamily(m, team, { ...meta, definition }, by);
    return { family: summarise(f, await findVersion(m, f)), preview };
  });
  await announceFamily(ds, team, saved.family);
  return saved;
}
