import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import type { DataSource } from 'typeorm';
import { CapturedMail } from '../db/entities';

/** Messages larger than this are refused: nothing Frostgrade sends comes close. */
const maxMessageBytes = 2 * 1024 * 1024;

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => v.address ?? '')).filter((s) => s.length > 0);
}

/**
 * A local SMTP server that accepts every message and stores it in PostgreSQL,
 * where the admin's outbox screen reads it. Development and tests only: it
 * authenticates nobody and relays nothing.
 */
export async function startCatcher(ds: DataSource, host: string, port: number): Promise<SMTPServer> {
  const repo = ds.getRepository(CapturedMail);
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    size: maxMessageBytes,
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          await repo.save(repo.create({
            from: addresses(parsed.from)[0] ?? '',
            to: addresses(parsed.to),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
          }));
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  return server;
}
