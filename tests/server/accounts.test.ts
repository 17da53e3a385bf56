import { meResponseSchema, signUpPreviewSchema, teamResponseSchema } from '../../shared/api';
import { accountMailDone, agent, agentAt, demo, fresh, mailTo as mailOf, newTeam, openContext, signedIn, tokenIn as linkToken, type TestContext } from './context';

let ctx: TestContext;
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });

const password = 'a long enough passphrase';

/** The newest mail to an address, as caught by the test stack's SMTP catcher. */
const mailTo = (address: string, subject?: RegExp) => mailOf(ctx, address, subject);

const tokenIn = (text: string, path: string): string => linkToken(text, path);

describe('sign-up, sign-in, sign-out', () => {
  it('sign-up makes a team with the new account as admin and a safe session cookie, in two steps', async () => {
    const client = agentAt(ctx);
    const email = fresh('founder');
    const asked = await client.post('/api/auth/sign-up').send({ email, displayName: 'Founder', teamName: 'Spin-off lab' });
    expect(asked.status).toBe(202);
    expect(asked.body.message).toMatch(/Check your inbox/);
    // No session yet: the address must first prove it is the requester's.
    expect(asked.headers['set-cookie']).toBeUndefined();
    const mail = await mailTo(email, /Finish creating your Frostgrade account/);
    expect(mail.text).toMatch(/Spin-off lab/);
    const token = tokenIn(mail.text, '/confirm-sign-up');
    const preview = signUpPreviewSchema.parse((await agentAt(ctx).get(`/api/sign-up/${token}`)).body);
    expect(preview).toMatchObject({ email, displayName: 'Founder', teamName: 'Spin-off lab' });
    const short = await client.post('/api/auth/sign-up/confirm').send({ token, password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.errors[0].field).toBe('password');
    const res = await client.post('/api/auth/sign-up/confirm').send({ token, password });
    expect(res.status).toBe(201);
    expect(meResponseSchema.parse(res.body)).toMatchObject({ user: { email, role: 'admin' }, team: { name: 'Spin-off lab' } });
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/frostgrade_session=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect((await client.get('/api/auth/me')).status).toBe(200);
    // A new team starts empty: none of the demo lab's families.
    expect((await client.get('/api/families')).body.families).toEqual([]);
    // The link works once.
    const again = await agentAt(ctx).post('/api/auth/sign-up/confirm').send({ token, password });
    expect(again.status).toBe(400);
    expect(again.body.errors[0].field).toBe('token');
    expect((await agentAt(ctx).get(`/api/sign-up/${token}`)).status).toBe(400);
    expect((await client.post('/api/auth/sign-out')).status).toBe(204);
    expect((await client.get('/api/auth/me')).status).toBe(401);
  });

  it('an expired sign-up link is refused', async () => {
    const email = fresh('slow.founder');
    await agentAt(ctx).post('/api/auth/sign-up').send({ email, displayName: 'Slow', teamName: 'Slow lab' });
    const token = tokenIn((await mailTo(email, /Finish creating/)).text, '/confirm-sign-up');
    await ctx.ds.query(`UPDATE sign_up_request SET expires_at = now() - interval '1 second' WHERE email = $1`, [email]);
    const late = await agentAt(ctx).post('/api/auth/sign-up/confirm').send({ token, password });
    expect(late.status).toBe(400);
    expect(late.body.errors[0].field).toBe('token');
    expect(await ctx.ds.query('SELECT 1 FROM app_user WHERE email = $1', [email])).toEqual([]);
  });

  it('answers an unknown e-mail and a wrong password alike', async () => {
    const unknown = await agent(ctx).post('/api/auth/sign-in').send({ email: fresh('nobody'), password: 'whatever-it-is' });
    const wrong = await agent(ctx).post('/api/auth/sign-in').send({ email: demo.viewer, password: 'not the password' });
    expect(unknown.status).toBe(400);
    expect(wrong.status).toBe(400);
    expect(unknown.body).toEqual(wrong.body);
  });

  it('rate-limits sign-in per account, naming the limit, with Retry-After', async () => {
    const { email } = await newTeam(ctx, { displayName: 'Target', teamName: 'Target lab' });
    const statuses: number[] = [];
    for (let i = 0; i < 9; i += 1) statuses.push((await agentAt(ctx).post('/api/auth/sign-in').send({ email, password: `guess number ${i}` })).status);
    expect(statuses.slice(0, 8)).toEqual(Array(8).fill(400));
    expect(statuses[8]).toBe(429);
    // Even the right password is refused until the window passes.
    const refused = await agentAt(ctx).post('/api/auth/sign-in').send({ email, password });
    expect(refused.status).toBe(429);
    expect(refused.body.message).toMatch(/at most 8 sign-in attempts for one account in 15 minutes/);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(refused.headers['retry-after'])).toBeLessThanOrEqual(15 * 60);
  });
});

describe('password reset by e-mail', () => {
  it('mails a single-use link; the old password stops working, old sessions end, and the owner is told', async () => {
    const { email, api: first } = await newTeam(ctx, { displayName: 'Forgetful', teamName: 'Reset lab' });
    const asked = await agentAt(ctx).post('/api/auth/reset-request').send({ email });
    expect(asked.status).toBe(202);
    const mail = await mailTo(email, /Reset your Frostgrade password/);
    const token = tokenIn(mail.text, '/reset-password');
    const newPassword = 'a brand new passphrase';
    expect((await agentAt(ctx).post('/api/auth/reset').send({ token, password: newPassword })).status).toBe(204);
    expect((await first.get('/api/auth/me')).status).toBe(401);
    expect((await mailTo(email, /Your Frostgrade password was changed/)).text).toMatch(/reset through an e-mailed link/);
    expect((await agentAt(ctx).post('/api/auth/sign-in').send({ email, password })).status).toBe(400);
    expect((await agentAt(ctx).post('/api/auth/sign-in').send({ email, password: newPassword })).status).toBe(200);
    const reused = await agentAt(ctx).post('/api/auth/reset').send({ token, password: 'yet another passphrase' });
    expect(reused.status).toBe(400);
    expect(reused.body.errors[0].field).toBe('token');
  });

  it('refuses an expired link and mails nothing for an unknown address', async () => {
    const { email } = await newTeam(ctx, { displayName: 'Late', teamName: 'Late lab' });
    await agentAt(ctx).post('/api/auth/reset-request').send({ email });
    const token = tokenIn((await mailTo(email, /Reset your/)).text, '/reset-password');
    await ctx.ds.query(`UPDATE password_reset SET expires_at = now() - interval '1 minute' WHERE user_id = (SELECT id FROM app_user WHERE email = $1)`, [email]);
    expect((await agentAt(ctx).post('/api/auth/reset').send({ token, password: 'too late passphrase' })).status).toBe(400);
    const ghost = fresh('ghost');
    expect((await agentAt(ctx).post('/api/auth/reset-request').send({ email: ghost })).status).toBe(202);
    // The worker has done the job, and sent nothing.
    expect(await accountMailDone(ctx, { kind: 'reset', email: ghost })).toMatch(/nothing sent/);
    expect(await ctx.ds.query('SELECT 1 FROM captured_mail WHERE $1 = ANY(mail_to)', [ghost])).toEqual([]);
  });

  it('rate-limits reset requests per account', async () => {
    const { email } = await newTeam(ctx, { displayName: 'Spammed', teamName: 'Spam lab' });
    const statuses: number[] = [];
    for (let i = 0; i < 4; i += 1) statuses.push((await agentAt(ctx).post('/api/auth/reset-request').send({ email })).status);
    expect(statuses).toEqual([202, 202, 202, 429]);
  });
});

describe('invitations and roles', () => {
  it('an admin invites by e-mail; the link creates the account in that team once', async () => {
    const admin = await signedIn(ctx, demo.admin);
    const email = fresh('new.grower');
    expect((await admin.post('/api/team/invitations').send({ email, role: 'grower' })).status).toBe(201);
    const mail = await mailTo(email, /invited to join a team/);
    expect(mail.subject).not.toMatch(/Northlight/);
    expect(mail.text).toMatch(/Northlight[\s\S]*as grower/);
    const token = tokenIn(mail.text, '/join');
    const preview = await agentAt(ctx).get(`/api/invitations/${token}`);
    expect(preview.body).toMatchObject({ email, role: 'grower', teamName: expect.stringMatching(/Northlight/) });
    const joined = agentAt(ctx);
    const res = await joined.post('/api/invitations/accept').send({ token, password, displayName: 'New Grower' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ user: { email, role: 'grower' }, team: { name: expect.stringMatching(/Northlight/) } });
    expect((await joined.get('/api/families')).status).toBe(200);
    expect((await joined.post('/api/families').send({})).status).toBe(403);
    expect((await agentAt(ctx).post('/api/invitations/accept').send({ token, password, displayName: 'Again' })).status).toBe(400);
    const team = teamResponseSchema.parse((await admin.get('/api/team')).body);
    expect(team.invitations.find((i) => i.email === email)?.state).toBe('accepted');
  });

  it('a revoked or expired invitation no longer works', async () => {
    const admin = await signedIn(ctx, demo.admin);
    const revokedEmail = fresh('revoked');
    await admin.post('/api/team/invitations').send({ email: revokedEmail, role: 'viewer' });
    const revokedToken = tokenIn((await mailTo(revokedEmail)).text, '/join');
    const id = teamResponseSchema.parse((await admin.get('/api/team')).body).invitations.find((i) => i.email === revokedEmail)!.id;
    expect((await admin.delete(`/api/team/invitations/${id}`)).status).toBe(204);
    expect((await agent(ctx).post('/api/invitations/accept').send({ token: revokedToken, password, displayName: 'X' })).status).toBe(400);
    const lateEmail = fresh('expired');
    await admin.post('/api/team/invitations').send({ email: lateEmail, role: 'viewer' });
    const lateToken = tokenIn((await mailTo(lateEmail)).text, '/join');
    await ctx.ds.query(`UPDATE invitation SET expires_at = now() - interval '1 second' WHERE email = $1`, [lateEmail]);
    expect((await agent(ctx).get(`/api/invitations/${lateToken}`)).status).toBe(400);
  });

  it('the last admin can be neither demoted nor removed; roles take effect at once', async () => {
    const { api: founder } = await newTeam(ctx, { displayName: 'Solo', teamName: 'Solo lab' });
    const me = (await founder.get('/api/auth/me')).body;
    const demote = await founder.put(`/api/team/members/${me.user.id}/role`).send({ role: 'viewer' });
    expect(demote.status).toBe(409);
    expect((await founder.delete(`/api/team/members/${me.user.id}`)).status).toBe(409);
    // Invite a second member, promote them, and then the founder may step down.
    const email = fresh('deputy');
    await founder.post('/api/team/invitations').send({ email, role: 'physicist' });
    const deputy = agentAt(ctx);
    const joined = await deputy.post('/api/invitations/accept').send({ token: tokenIn((await mailTo(email)).text, '/join'), password, displayName: 'Deputy' });
    expect((await deputy.post('/api/families').send({ name: 'Deputy alloy', source: 'x', definition: { kind: 'constant', seebeck: 2e-4, sigma: 1e5, kappa: 1.5 } })).status).toBe(201);
    expect((await founder.put(`/api/team/members/${joined.body.user.id}/role`).send({ role: 'viewer' })).status).toBe(200);
    expect((await deputy.post('/api/families').send({ name: 'Deputy alloy 2', source: 'x', definition: { kind: 'constant', seebeck: 2e-4, sigma: 1e5, kappa: 1.5 } })).status).toBe(403);
    expect((await founder.put(`/api/team/members/${joined.body.user.id}/role`).send({ role: 'admin' })).status).toBe(200);
    expect((await founder.put(`/api/team/members/${me.user.id}/role`).send({ role: 'viewer' })).status).toBe(200);
    expect((await founder.post('/api/team/invitations').send({ email: fresh('late'), role: 'viewer' })).status).toBe(403);
  });
});
