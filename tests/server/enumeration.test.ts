import { randomBytes } from 'node:crypto';
import { teamResponseSchema } from '../../shared/api';
import { accountMailDone, agentAt, eventually, fresh, mailTo, newTeam, openContext, signedIn, type NewTeam, type TestContext } from './context';

/**
 * No request tells whether an address has an account: sign-up, invitation
 * and reset answer alike for both, in the same time (the mail leaves from a
 * worker, after the answer), and only the mailbox's owner learns anything.
 * Timing is compared, never bounded: medians of known and unknown addresses,
 * measured alternately on the same stack, within 50 ms of each other.
 */
let ctx: TestContext;
let owners: NewTeam;
/** Addresses with accounts (members of one team, straight into the database: no mail needed to make them). */
const known: string[] = [];
const rounds = 8;
jest.setTimeout(180_000);

beforeAll(async () => {
  ctx = await openContext();
  owners = await newTeam(ctx, { displayName: 'Owners', teamName: 'Owners lab' });
  for (let i = 0; i < rounds; i += 1) {
    const id = randomBytes(15).toString('base64url');
    const email = fresh(`known${i}`);
    await ctx.ds.query(`INSERT INTO app_user (id, team_id, email, display_name, password_hash, role) VALUES ($1, $2, $3, $4, '!', 'viewer')`, [id, owners.teamId, email, `Known ${i}`]);
    known.push(email);
  }
});
afterAll(async () => { await ctx.close(); });

type Answer = { status: number; body: unknown; ms: number };

const median = (xs: number[]): number => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2]! : (s[s.length / 2 - 1]! + s[s.length / 2]!) / 2;
};

async function timed(send: () => Promise<{ status: number; body: unknown }>): Promise<Answer> {
  const t0 = process.hrtime.bigint();
  const res = await send();
  return { status: res.status, body: res.body, ms: Number(process.hrtime.bigint() - t0) / 1e6 };
}

/** Alternates known and unknown addresses (so drift in the machine's load hits both alike) and compares. */
async function compare(what: string, send: (email: string, i: number) => Promise<{ status: number; body: unknown }>): Promise<{ known: Answer[]; unknown: Answer[]; unknownEmails: string[] }> {
  const out = { known: [] as Answer[], unknown: [] as Answer[], unknownEmails: [] as string[] };
  for (let i = 0; i < rounds; i += 1) {
    const stranger = fresh(`stranger${i}`);
    out.unknownEmails.push(stranger);
    if (i % 2 === 0) {
      out.known.push(await timed(() => send(known[i]!, i)));
      out.unknown.push(await timed(() => send(stranger, i)));
    } else {
      out.unknown.push(await timed(() => send(stranger, i)));
      out.known.push(await timed(() => send(known[i]!, i)));
    }
  }
  const [k, u] = [median(out.known.map((a) => a.ms)), median(out.unknown.map((a) => a.ms))];
  console.log(`${what}: median ${k.toFixed(1)} ms for addresses with an account, ${u.toFixed(1)} ms without (difference ${Math.abs(k - u).toFixed(1)} ms, ${rounds} each)`);
  expect(Math.abs(k - u)).toBeLessThan(50);
  return out;
}

it('sign-up answers alike for a registered address and a new one; the owner is told, the stranger gets the link', async () => {
  const r = await compare('sign-up request', (email, i) => agentAt(ctx).post('/api/auth/sign-up').send({ email, displayName: `Someone ${i}`, teamName: `Lab ${i}` }));
  for (const a of [...r.known, ...r.unknown]) {
    expect(a.status).toBe(202);
    expect(a.body).toEqual(r.unknown[0]!.body);
  }
  const notice = await mailTo(ctx, known[0]!, /Someone tried to create a Frostgrade account with your address/);
  expect(notice.text).toMatch(/\/sign-in[\s\S]*\/forgot-password/);
  expect(notice.text).not.toMatch(/confirm-sign-up/);
  expect((await mailTo(ctx, r.unknownEmails[0]!, /Finish creating your Frostgrade account/)).text).toMatch(/\/confirm-sign-up\?token=/);
  // No sign-up request (and so no link) exists for a registered address.
  expect(await ctx.ds.query('SELECT 1 FROM sign_up_request WHERE email = ANY($1)', [known])).toEqual([]);
});

it('a password reset answers alike for a registered address and a new one; only the owner gets a link', async () => {
  const r = await compare('reset request', (email) => agentAt(ctx).post('/api/auth/reset-request').send({ email }));
  for (const a of [...r.known, ...r.unknown]) {
    expect(a.status).toBe(202);
    expect(a.body).toEqual(r.unknown[0]!.body);
  }
  expect((await mailTo(ctx, known[1]!, /Reset your Frostgrade password/)).text).toMatch(/\/reset-password\?token=/);
  expect(await accountMailDone(ctx, { kind: 'reset', email: r.unknownEmails[1]! })).toMatch(/nothing sent/);
  expect(await ctx.ds.query('SELECT 1 FROM captured_mail WHERE $1 = ANY(mail_to)', [r.unknownEmails[1]])).toEqual([]);
});

it('an invitation answers the admin alike for a registered address and a new one; the owner hears they cannot join a second team', async () => {
  const inviters = await newTeam(ctx, { displayName: 'Inviter', teamName: 'Inviting lab' });
  const r = await compare('invitation', (email) => inviters.api.post('/api/team/invitations').send({ email, role: 'viewer' }));
  for (const a of [...r.known, ...r.unknown]) expect(a.status).toBe(201);
  // Every invitation is listed the same way: pending, with the same fields.
  const team = teamResponseSchema.parse((await inviters.api.get('/api/team')).body);
  const shape = (email: string) => {
    const i = team.invitations.find((x) => x.email === email)!;
    return { state: i.state, role: i.role, invitedBy: i.invitedBy };
  };
  expect(shape(known[2]!)).toEqual(shape(r.unknownEmails[2]!));
  expect(shape(known[2]!)).toEqual({ state: 'pending', role: 'viewer', invitedBy: 'Inviter' });
  const notice = await mailTo(ctx, known[2]!, /invited to join a team/);
  expect(notice.text).toMatch(/belongs to another team[\s\S]*cannot join Inviting lab/);
  expect(notice.text).not.toMatch(/\/join\?token=/);
  expect((await mailTo(ctx, r.unknownEmails[2]!, /invited to join a team/)).text).toMatch(/\/join\?token=/);
  // The inviting admin's outbox shows the stranger's invitation, never the owner's notice.
  const outbox = (await inviters.api.get('/api/outbox')).body.messages as Array<{ to: string[] }>;
  expect(outbox.some((m) => m.to.includes(r.unknownEmails[2]!))).toBe(true);
  expect(outbox.some((m) => m.to.includes(known[2]!))).toBe(false);
});

it('a notice to an owner is readable in the owner\'s own team outbox', async () => {
  await eventually(async () => {
    const outbox = (await owners.api.get('/api/outbox')).body.messages as Array<{ to: string[]; subject: string }>;
    return outbox.find((m) => m.to.includes(known[0]!) && /Someone tried/.test(m.subject));
  });
  // …and never another team's (the demo lab knows nothing of these addresses).
  const lab = await signedIn(ctx, 'ada@northlight.example');
  const theirs = (await lab.get('/api/outbox')).body.messages as Array<{ to: string[] }>;
  expect(theirs.some((m) => known.some((k) => m.to.includes(k)))).toBe(false);
});
