/**
 * `NODE_ENV=production npm start` as a lab runs it: it refuses to start
 * without its address and a mail relay, and otherwise starts without the demo
 * lab, with a durable, password-protected private cluster and no mail
 * catcher; the first admin is made from the command line.
 */
import { spawn } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Client } from 'pg';
import { freshDataRoot, npmStart, privateStack, signIn, type NpmStart } from './npm-start';

jest.setTimeout(600_000);
const root = join(__dirname, '..', '..');
const settings = privateStack('production', 23);
let stack: NpmStart | undefined;
afterAll(async () => { await stack?.interrupt(); });

/** Runs a command of the project with the given environment; resolves with its exit code and output. */
function run(args: string[], env: NodeJS.ProcessEnv, stdin = ''): Promise<{ code: number | null; output: string }> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, args, { cwd: root, env, stdio: ['pipe', 'pipe', 'pipe'] });
    let output = '';
    child.stdout.on('data', (b: Buffer) => { output += b.toString(); });
    child.stderr.on('data', (b: Buffer) => { output += b.toString(); });
    child.stdin.end(stdin);
    child.once('exit', (code) => resolve({ code, output }));
  });
}

const base = (): NodeJS.ProcessEnv => ({
  ...process.env, NODE_ENV: 'production', PG_DATA_ROOT: settings.pgDataRoot, PG_PORT: String(settings.pgPort), PORT: String(settings.port),
  APP_ORIGIN: undefined, SMTP_HOST: undefined, MAIL_FROM: undefined, DATABASE_URL: undefined, FROSTGRADE_PROFILE: undefined,
});

it('refuses to start without APP_ORIGIN, SMTP_HOST and MAIL_FROM, naming each, and touches nothing', async () => {
  freshDataRoot(settings.pgDataRoot);
  const { code, output } = await run(['server/ops/launch.js', 'start'], base());
  expect(code).toBe(1);
  expect(output).toMatch(/not starting in production/);
  for (const name of ['APP_ORIGIN', 'SMTP_HOST', 'MAIL_FROM']) expect(output).toContain(`${name} is not set`);
  expect(existsSync(settings.pgDataRoot)).toBe(false);
});

it('starts without demo data, on a durable cluster that asks for a password, without a mail catcher; the first admin comes from the command line', async () => {
  const origin = `http://127.0.0.1:${settings.port}`;
  // The test stack's mail catcher plays the lab's relay.
  const relay = { APP_ORIGIN: origin, SMTP_HOST: '127.0.0.1', SMTP_PORT: process.env.SMTP_PORT ?? '2526', MAIL_FROM: 'Frostgrade <frostgrade@lab.example>' };
  stack = await npmStart({ ...settings, env: { NODE_ENV: 'production', ...relay } });
  const text = stack.output.join('\n');
  expect(text).toMatch(/ready in .* \(production\)/);
  expect(text).not.toMatch(/graded-legs-demo|demo data added|catching SMTP/);

  const password = readFileSync(join(settings.pgDataRoot, 'prod', 'postgres-password'), 'utf8').trim();
  const db = new Client({ host: '127.0.0.1', port: settings.pgPort, user: 'postgres', password, database: 'frostgrade' });
  await db.connect();
  try {
    expect((await db.query('SHOW fsync')).rows[0].fsync).toBe('on');
    expect((await db.query('SELECT count(*)::int AS n FROM team')).rows[0].n).toBe(0);
    // Without the password the cluster answers no one, even on loopback.
    const guest = new Client({ host: '127.0.0.1', port: settings.pgPort, user: 'postgres', password: 'wrong', database: 'frostgrade' });
    await expect(guest.connect()).rejects.toThrow(/password authentication failed/);

    const env = { ...base(), ...relay };
    const made = await run(['--require', 'tsx/cjs', 'server/ops/admin.ts', 'create', '--email', 'ines@lab.example', '--name', 'Ines Head', '--team', 'Cold Plate Lab'], env, 'a-long-first-passphrase\n');
    expect(made.output).toContain('ines@lab.example is the admin of the new team "Cold Plate Lab"');
    expect(made.code).toBe(0);
    const again = await run(['--require', 'tsx/cjs', 'server/ops/admin.ts', 'create', '--email', 'ines@lab.example', '--name', 'Ines', '--team', 'Other'], env, 'a-long-first-passphrase\n');
    expect(again.code).toBe(1);
    expect(again.output).toMatch(/email: an account with this e-mail exists already/);
    const short = await run(['--require', 'tsx/cjs', 'server/ops/admin.ts', 'create', '--email', 'x@lab.example', '--name', 'X', '--team', 'Lab X'], env, 'short\n');
    expect(short.output).toMatch(/password: password must be at least 10 characters/);
    expect((await db.query('SELECT email, role FROM app_user')).rows).toEqual([{ email: 'ines@lab.example', role: 'admin' }]);
  } finally {
    await db.end();
  }

  const admin = await signIn(origin, 'ines@lab.example', 'a-long-first-passphrase');
  expect((await admin.api('GET', '/team')).status).toBe(200);
  // No catcher, so no Outbox: mail goes to the relay.
  expect((await admin.api('GET', '/outbox')).status).toBe(404);
});
