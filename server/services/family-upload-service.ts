import { join } from 'node:path';
import type { DataSource } from 'typeorm';
import type { UploadPreview, UploadSaved } from '../../shared/api';
import { Team } from '../db/entities';
import { ValidationError } from '../http/errors';
import { inApiThread } from './api-threads';
import { announceFamily, insertFamily } from './family-service';
import type { UploadThreadAnswer } from './family-upload-thread';
import { findVersion, summarise } from './family-store';

/** Decodes an uploaded file as UTF-8 text, refusing binaries instead of parsing noise. */
export function uploadText(buffer: Buffer): string {
  if (buffer.includes(0)) throw new ValidationError([{ field: 'file', message: 'the file is not text (it contains NUL bytes); upload a CSV file' }]);
  return buffer.toString('utf8');
}

const uploadThread = join(__dirname, 'family-upload-thread.ts');

/** Parses and checks the file off the event loop; a file over a size cap is refused whole (400, field `file`). */
export async function previewUpload(buffer: Buffer): Promise<UploadPreview> {
  const answer = await inApiThread<UploadThreadAnswer>(uploadThread, uploadText(buffer), 'file');
  if ('refused' in answer) throw new ValidationError([{ field: 'file', message: answer.refused }]);
  return answer.preview;
}

/** All or nothing: an upload with any error saves nothing and answers with every error located. */
export async function saveUpload(ds: DataSource, team: Team, buffer: Buffer, meta: { name: string; source: string; summary: string }, by: string): Promise<UploadSaved> {
  const preview = await previewUpload(buffer);
  if (!preview.ok) {
    throw new ValidationError(preview.errors.map((e) => ({
      field: ['file', e.line ? `line ${e.line}` : '', e.column ?? ''].filter(Boolean).join(':'),
      message: e.message,
    })));
  }
  const definition = { kind: 'table' as const, rows: preview.rows.map(({ line: _line, ...r }) => r) };
  const saved = await ds.transaction(async (m) => {
    // The thread has built the engine family already (the preview is ok), so its carrier stands.
    const f = await insertFamily(m, team, { ...meta, definition }, by, preview.carrier === 'n' ? 'n' : 'p');
    return { family: summarise(f, await findVersion(m, f)), preview };
  });
  await announceFamily(ds, team, saved.family);
  return saved;
}
