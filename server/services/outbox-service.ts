import type { DataSource } from 'typeorm';
import { CapturedMail } from '../db/entities';

/** The newest captured messages first; capped so the screen stays light. */
export async function listOutbox(ds: DataSource, limit = 200) {
  const rows = await ds.getRepository(CapturedMail).find({ order: { receivedAt: 'DESC' }, take: limit });
  return {
    messages: rows.map((m) => ({ id: m.id, receivedAt: m.receivedAt.toISOString(), from: m.from, to: m.to, subject: m.subject, text: m.text })),
  };
}
