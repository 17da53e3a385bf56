import 'reflect-metadata';
import { createInterface } from 'node:readline';
import { parseArgs } from 'node:util';
import { z } from 'zod';
import { signUpConfirmSchema, signUpRequestSchema } from '../../shared/api';
import { recordAudit } from '../audit/audit-log';
import { hashPassword } from '../auth/passwords';
import { readEnv } from '../config/env';
import { createDataSource } from '../db/data-source';
import { ValidationError } from '../http/errors';
import { createTeamWithAdmin } from '../services/new-team';
import { provideDatabase } from './database';
import { stopCluster } from './postgres';

const usage = 'usage: npm run -s admin -- create --email you@lab.example --name "Your Name" --team "Your lab"   (the password is read from the terminal, or the first line of standard input)';

/** Reads the password without echoing it at a terminal; from a pipe, its first line. */
async function readPassword(): Promise<string> {
  const rl = createInterface({ input: process.stdin, output: process.stdout, terminal: process.stdin.isTTY });
  if (process.stdin.isTTY) {
    process.stdout.write('Password for the new admin (at least 10 characters): ');
    // Echo nothing of what is typed.
    (rl as unknown as { _writeToOutput: (s: string) => void })._writeToOutput = () => undefined;
  }
  const line = await new Promise<string>((resolve) => rl.once('line', resolve).once('close', () => resolve('')));
  rl.close();
  if (process.stdin.isTTY) process.stdout.write('\n');
  return line;
}

/**
 * `npm run admin -- create …`: the first admin of a production installation
 * (which has no demo lab and no sign-up link yet), made from the server's
 * command line. Against the same database `npm start` uses: DATABASE_URL, or
 * the private cluster of this profile (started for the moment if it is not
 * running).
 */
async function main(): Promise<void> {
  const { positionals, values } = parseArgs({ allowPositionals: true, options: { email: { type: 'string' }, name: { type: 'string' }, team: { type: 'string' } } });
  if (positionals[0] !== 'create') throw new Error(usage);
  const fields = z.object({ email: signUpRequestSchema.shape.email, displayName: signUpRequestSchema.shape.displayName, teamName: signUpRequestSchema.shape.teamName, password: signUpConfirmSchema.shape.password });
  const parsed = fields.safeParse({ email: values.email, displayName: values.name, teamName: values.team, password: await readPassword() });
  if (!parsed.success) throw new Error(`${parsed.error.issues.map((i) => `${i.path.join('.') === 'displayName' ? 'name' : i.path.join('.') === 'teamName' ? 'team' : i.path.join('.')}: ${i.message}`).join('; ')}\n${usage}`);
  const env = readEnv({ ...process.env, FROSTGRADE_PROFILE: process.env.NODE_ENV === 'production' ? 'prod' : 'dev' });
  const db = await provideDatabase(env);
  const ds = await createDataSource(db.url, 'frostgrade-admin').initialize();
  try {
    const passwordHash = await hashPassword(parsed.data.password);
    const made = await ds.transaction(async (m) => {
      const created = await createTeamWithAdmin(m, { ...parsed.data, passwordHash });
      // No network address: it was made on the server's own command line.
      await recordAudit(m, { teamId: created.teamId, actorId: created.userId, actorName: parsed.data.displayName, ip: null }, { action: 'team-created', summary: `created the team ${parsed.data.teamName} with npm run admin`, email: parsed.data.email, subjectId: created.teamId });
      return created;
    });
    console.log(`[admin] ${parsed.data.email} is the admin of the new team "${parsed.data.teamName}" (user ${made.userId}); sign in at ${env.appOrigin} and invite the others from Team.`);
  } catch (err) {
    // The command line names fields as its own flags do, not as the web form labels them.
    if (err instanceof ValidationError) throw new Error((err.errors ?? []).map((e) => `${e.field}: ${e.message}`).join('; '));
    throw err;
  } finally {
    await ds.destroy();
    if (db.cluster?.startedHere) stopCluster(db.cluster);
  }
}

main().catch((err: Error) => {
  console.error(`[admin] ${err.message}`);
  process.exit(1);
});
