import { parse } from 'csv-parse/sync';
import { auditPageSchema, teamResponseSchema, type AuditEvent } from '../../shared/api';
import { agentAt, anAddress, demo, eventually, fresh, mailTo, newTeam, openContext, signedIn, tokenIn, type NewTeam, type TestContext } from './context';

/**
 * The audit trail against the real stack: each kind of event is recorded
 * with who, what, when and from which address, only the team's admins read
 * it (newest first, a page at a time), and it exports as CSV.
 */
let ctx: TestContext;
let team: NewTeam;
const adminIp = anAddress();
const started = new Date(Date.now() - 1000);
jest.setTimeout(240_000);
beforeAll(async () => {
  ctx = await openContext();
  team = await newTeam(ctx, { displayName: 'Audra Admin', teamName: 'Audited lab', ip: adminIp });
});
afterAll(async () => { await ctx.close(); });

type Api = NewTeam['api'];

/** Every event of the caller's team trail, newest first, read page by page. */
async function trail(api: Api, limit = 200): Promise<AuditEvent[]> {
  const events: AuditEvent[] = [];
  let before: string | null = null;
  do {
    const res = await api.get(`/api/audit?limit=${limit}${before ? `&before=${before}` : ''}`);
    expect(res.status).toBe(200);
    const page = auditPageSchema.parse(res.body);
    events.push(...page.events);
    before = page.next;
  } while (before);
  return events;
}

function expectEvent(events: AuditEvent[], match: Partial<AuditEvent>, summary: RegExp): AuditEvent {
  const found = events.find((e) => Object.entries(match).every(([k, v]) => e[k as keyof AuditEvent] === v) && summary.test(e.summary));
  if (!found) throw new Error(`no event ${JSON.stringify(match)} ${summary} in:\n${events.map((e) => `${e.action} ${e.actor} ${e.email} ${e.ip} ${e.summary}`).join('\n')}`);
  expect(Date.parse(found.at)).toBeGreaterThanOrEqual(started.getTime());
  expect(Date.parse(found.at)).toBeLessThanOrEqual(Date.now());
  return found;
}

it('records sign-ins, failed ones with the address tried, invitations, joining, role changes, revocations and removals', async () => {
  const visitorIp = anAddress();
  expect((await agentAt(ctx, visitorIp).post('/api/auth/sign-in').send({ email: team.email, password: 'not the password' })).status).toBe(400);
  const unknown = fresh('unknown.visitor');
  expect((await agentAt(ctx, visitorIp).post('/api/auth/sign-in').send({ email: unknown, password: 'whatever it is' })).status).toBe(400);
  expect((await agentAt(ctx, adminIp).post('/api/auth/sign-in').send({ email: team.email, password: team.password })).status).toBe(200);

  const memberEmail = fresh('audited.member');
  const formulaName = '=HYPERLINK("http://evil.example","click")';
  expect((await team.api.post('/api/team/invitations').send({ email: memberEmail, role: 'physicist' })).status).toBe(201);
  const memberIp = anAddress();
  const joined = await agentAt(ctx, memberIp).post('/api/invitations/accept').send({ token: tokenIn((await mailTo(ctx, memberEmail, /invited/)).text, '/join'), password: 'a member passphrase', displayName: formulaName });
  expect(joined.status).toBe(201);
  const memberId = joined.body.user.id as string;
  expect((await team.api.put(`/api/team/members/${memberId}/role`).send({ role: 'viewer' })).status).toBe(200);
  const revokedEmail = fresh('revoked.audit');
  await team.api.post('/api/team/invitations').send({ email: revokedEmail, role: 'grower' });
  const invitation = teamResponseSchema.parse((await team.api.get('/api/team')).body).invitations.find((i) => i.email === revokedEmail)!;
  expect((await team.api.delete(`/api/team/invitations/${invitation.id}`)).status).toBe(204);
  expect((await team.api.delete(`/api/team/members/${memberId}`)).status).toBe(204);

  const events = await trail(team.api);
  const admin = { actor: 'Audra Admin', actorId: team.userId };
  expectEvent(events, { action: 'team-created', ...admin, ip: adminIp, email: team.email }, /created the team Audited lab/);
  expectEvent(events, { action: 'sign-in-failed', actor: null, email: team.email, ip: visitorIp }, /wrong e-mail or password/);
  expectEvent(events, { action: 'sign-in', ...admin, ip: adminIp }, /signed in/);
  expectEvent(events, { action: 'invitation-sent', ...admin, email: memberEmail }, /invited .* as physicist/);
  expectEvent(events, { action: 'invitation-accepted', actor: formulaName, actorId: memberId, ip: memberIp }, /joined the team as physicist/);
  expectEvent(events, { action: 'role-changed', ...admin, subjectId: memberId }, /from physicist to viewer/);
  expectEvent(events, { action: 'invitation-revoked', ...admin, email: revokedEmail }, /revoked the invitation/);
  expectEvent(events, { action: 'member-removed', ...admin, subjectId: memberId, email: memberEmail }, /removed .* \(viewer\) from the team/);
  // The unknown address's failure is in no team's trail.
  expect(events.some((e) => e.email === unknown)).toBe(false);
  const [{ n }] = await ctx.ds.query('SELECT count(*)::int AS n FROM audit_event WHERE email = $1 AND team_id IS NULL', [unknown]);
  expect(n).toBe(1);
  // Newest first.
  const ids = events.map((e) => BigInt(e.id));
  expect(ids).toEqual([...ids].sort((a, b) => (a > b ? -1 : a < b ? 1 : 0)));
});

it('pages newest first without gaps or repeats', async () => {
  const all = await trail(team.api);
  expect(all.length).toBeGreaterThan(5);
  const paged = await trail(team.api, 3);
  expect(paged.map((e) => e.id)).toEqual(all.map((e) => e.id));
  const bad = await team.api.get('/api/audit?limit=500');
  expect(bad.status).toBe(400);
  expect(bad.body.errors[0].field).toBe('limit');
});

it('exports the trail as CSV, formula-looking cells neutralised, and records the export', async () => {
  const res = await team.api.get('/api/audit/export.csv');
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toMatch(/text\/csv/);
  expect(res.headers['content-disposition']).toMatch(/attachment; filename="?audit-audited-lab-[0-9a-f]+-\d{4}-\d{2}-\d{2}\.csv"?$/);
  const text = res.text;
  const records = parse(text, { relax_column_count: false }) as string[][];
  expect(records[0]).toEqual(['at_utc', 'action', 'actor', 'actor_id', 'email', 'subject_id', 'summary', 'ip']);
  expect(records[1]!.slice(1, 3)).toEqual(['audit-exported', 'Audra Admin']);
  const events = await trail(team.api);
  // One record per event under the header (the export itself included), and nothing after the last line end.
  expect(records.length).toBe(events.length + 1);
  expect(text.endsWith('\n')).toBe(true);
  // The member named like a formula: kept as text behind an apostrophe, quoted as RFC 4180 says.
  expect(records.flat()).toContain(`'=HYPERLINK("http://evil.example","click")`);
  expect(text).not.toMatch(/(^|,)=HYPERLINK/m);
});

it('only admins read it, and only their own team\'s', async () => {
  const member = await signedIn(ctx, demo.physicist);
  expect((await member.get('/api/audit')).status).toBe(403);
  expect((await member.get('/api/audit/export.csv')).status).toBe(403);
  const other = await signedIn(ctx, demo.otherTeamAdmin);
  const theirs = await trail(other);
  expect(theirs.some((e) => e.actorId === team.userId)).toBe(false);
});

it('records releases, sheet exports, module deletions and family archiving in the demo lab', async () => {
  const ip = anAddress();
  const lab = (await signedIn(ctx, demo.admin)).set('X-Forwarded-For', ip);
  const families = (await lab.get('/api/families')).body.families as Array<{ id: string; isDemo: boolean; kind: string; carrier: string }>;
  const p = families.find((f) => f.isDemo && f.kind === 'band' && f.carrier === 'p')!;
  const n = families.find((f) => f.isDemo && f.kind === 'band' && f.carrier === 'n')!;
  const design = (await lab.post('/api/designs').send({ name: `Audit ${Date.now()}`, familyId: p.id, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 4, starts: 1 })).body.design.id as string;
  const runId = (await lab.post(`/api/designs/${design}/runs`)).body.run.id as string;
  await eventually(async () => ((await lab.get(`/api/runs/${runId}`)).body.run.state === 'succeeded' ? true : undefined), 120);
  const batch = `AUD-${Date.now()}`;
  const orderId = (await lab.post(`/api/runs/${runId}/release`).send({ batch })).body.order.id as string;
  await eventually(async () => ((await lab.get(`/api/growth-orders/${orderId}`)).body.order.sheetStatus === 'ready' ? true : undefined), 120);
  expect((await lab.get(`/api/growth-orders/${orderId}/sheet.csv`)).status).toBe(200);
  const leg = (familyId: string, perCm3: number) => ({ kind: 'family', familyId, perCm3, lengthMm: 1.5, areaMm2: 1 });
  const moduleName = `Audit module ${Date.now()}`;
  const moduleId = (await lab.post('/api/modules').send({ name: moduleName, p: leg(p.id, 1.3e19), n: leg(n.id, 2e19), hotSide: 300, deltaT: 30, couples: 10 })).body.module.id as string;
  expect((await lab.delete(`/api/modules/${moduleId}`)).status).toBe(204);
  const familyName = `Audit alloy ${Date.now()}`;
  const familyId = (await lab.post('/api/families').send({ name: familyName, source: 'audit test', definition: { kind: 'constant', seebeck: 2e-4, sigma: 1e5, kappa: 1.5 } })).body.family.id as string;
  expect((await lab.post(`/api/families/${familyId}/archive`)).status).toBe(200);
  expect((await lab.post(`/api/families/${familyId}/unarchive`)).status).toBe(200);

  // Other test files write to the demo lab's trail at the same time: look for ours.
  const events = await trail(lab);
  const ada = { actor: 'Ada Lindqvist', ip };
  expectEvent(events, { action: 'order-released', ...ada, subjectId: orderId }, new RegExp(`to growth as batch ${batch}`));
  expectEvent(events, { action: 'sheet-exported', ...ada, subjectId: orderId }, new RegExp(`growth-${batch}-\\d+-zones\\.csv`));
  expectEvent(events, { action: 'module-deleted', ...ada, subjectId: moduleId }, new RegExp(`deleted the module ${moduleName}`));
  expectEvent(events, { action: 'family-archived', ...ada, subjectId: familyId }, new RegExp(`archived the family ${familyName}`));
  expectEvent(events, { action: 'family-unarchived', ...ada, subjectId: familyId }, new RegExp(`restored the family ${familyName}`));
});
