import { meResponseSchema, teamResponseSchema } from '../../shared/api';
import { agent, demo, eventually, openContext, signedIn, type TestContext } from './context';

let ctx: TestContext;
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });

const fresh = (stem: string): string => `${stem}.${Date.now()}.${Math.round(Math.random() * 1e9)}@example.test`;
const password = 'a long enough passphrase';

/** The newest mail to an address, as caught by the test stack's SMTP catcher. */
async function mailTo(address: string): Promise<{ subject: string; text: string }> {
  return eventually(async () => {
    const rows = await ctx.ds.query('SELECT subject, text FROM captured_mail WHERE $1 = ANY(mail_to) ORDER BY received_at DESC LIMIT 1', [address]);
    return rows[0] as { subject: string; text: string } | undefined;
  });
}

const tokenIn = (text: string, path: string): string => new RegExp(`${path}\\?token=([A-Za-z0-9_-]+)`).exec(text)![1]!;

describe('sign-up, sign-in, sign-out', () => {
  it('sign-up makes a team with the new account as admin and a safe session cookie', async () => {
    const client = agent(ctx);
    const email = fresh('founder');
    const res = await client.post('/api/auth/sign-up').send({ email, password, displayName: 'Founder', teamName: 'Spin-off lab' });
    expect(res.status).toBe(201);
    expect(meResponseSchema.parse(res.body)).toMatchObject({ user: { email, role: 'admin' }, team: { name: 'Spin-off lab' } });
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/frostgrade_session=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect((await client.get('/api/auth/me')).status).toBe(200);
    // A new team starts empty: none of the demo lab's families.
    expect((await client.get('/api/families')).body.families).toEqual([]);
    expect((await client.post('/api/auth/sign-out')).status).toBe(204);
    expect((await client.get('/api/auth/me')).status).toBe(401);
  });

  it('answers an unknown e-mail and a wrong password alike', async () => {
    const unknown = await agent(ctx).post('/api/auth/sign-in').send({ email: fresh('nobody'), password: 'whatever-it-is' });
    const wrong = await agent(ctx).post('/api/auth/sign-in').send({ email: demo.viewer, password: 'not the password' });
    expect(unknown.status).toBe(400);
    expect(wrong.status).toBe(400);
    expect(unknown.body).toEqual(wrong.body);
  });

  it('rate-limits sign-in per account', async () => {
    const email = fresh('target');
    await agent(ctx).post('/api/auth/sign-up').send({ email, password, displayName: 'Target', teamName: 'Target lab' });
    const statuses: number[] = [];
    for (let i = 0; i < 9; i += 1) statuses.push((await agent(ctx).post('/api/auth/sign-in').send({ email, password: `guess number ${i}` })).status);
    expect(statuses.slice(0, 8)).toEqual(Array(8).fill(400));
    expect(statuses[8]).toBe(429);
    // Even the right password is refused until the window passes.
    expect((await agent(ctx).post('/api/auth/sign-in').send({ email, password })).status).toBe(429);
  });
});

describe('password reset by e-mail', () => {
  it('mails a single-use link; the old password stops working and old sessions end', async () => {
    const email = fresh('forgetful');
    const first = agent(ctx);
    await first.post('/api/auth/sign-up').send({ email, password, displayName: 'Forgetful', teamName: 'Reset lab' });
    const asked = await agent(ctx).post('/api/auth/reset-request').send({ email });
    expect(asked.status).toBe(202);
    const mail = await mailTo(email);
    expect(mail.subject).toMatch(/Reset your Frostgrade password/);
    const token = tokenIn(mail.text, '/reset-password');
    const newPassword = 'a brand new passphrase';
    expect((await agent(ctx).post('/api/auth/reset').send({ token, password: newPassword })).status).toBe(204);
    expect((await first.get('/api/auth/me')).status).toBe(401);
    expect((await agent(ctx).post('/api/auth/sign-in').send({ email, password })).status).toBe(400);
    expect((await agent(ctx).post('/api/auth/sign-in').send({ email, password: newPassword })).status).toBe(200);
    const reused = await agent(ctx).post('/api/auth/reset').send({ token, password: 'yet another passphrase' });
    expect(reused.status).toBe(400);
    expect(reused.body.errors[0].field).toBe('token');
  });

  it('refuses an expired link and mails nothing for an unknown address', async () => {
    const email = fresh('late');
    await agent(ctx).post('/api/auth/sign-up').send({ email, password, displayName: 'Late', teamName: 'Late lab' });
    await agent(ctx).post('/api/auth/reset-request').send({ email });
    const token = tokenIn((await mailTo(email)).text, '/reset-password');
    await ctx.ds.query(`UPDATE password_reset SET expires_at = now() - interval '1 minute' WHERE user_id = (SELECT id FROM app_user WHERE email = $1)`, [email]);
    expect((await agent(ctx).post('/api/auth/reset').send({ token, password: 'too late passphrase' })).status).toBe(400);
    const ghost = fresh('ghost');
    expect((await agent(ctx).post('/api/auth/reset-request').send({ email: ghost })).status).toBe(202);
    await new Promise((r) => setTimeout(r, 500));
    expect(await ctx.ds.query('SELECT 1 FROM captured_mail WHERE $1 = ANY(mail_to)', [ghost])).toEqual([]);
  });

  it('rate-limits reset requests per account', async () => {
    const email = fresh('spammed');
    await agent(ctx).post('/api/auth/sign-up').send({ email, password, displayName: 'Spammed', teamName: 'Spam lab' });
    const statuses: number[] = [];
    for (let i = 0; i < 4; i += 1) statuses.push((await agent(ctx).post('/api/auth/reset-request').send({ email })).status);
    expect(statuses).toEqual([202, 202, 202, 429]);
  });
});

describe('invitations and roles', () => {
  it('an admin invites by e-mail; the link creates the account in that team once', async () => {
    const admin = await signedIn(ctx, demo.admin);
    const email = fresh('new.grower');
    expect((await admin.post('/api/team/invitations').send({ email, role: 'grower' })).status).toBe(201);
    const mail = await mailTo(email);
    expect(mail.text).toMatch(/as grower/);
    const token = tokenIn(mail.text, '/join');
    const preview = await agent(ctx).get(`/api/invitations/${token}`);
    expect(preview.body).toMatchObject({ email, role: 'grower', teamName: expect.stringMatching(/Northlight/) });
    const joined = agent(ctx);
    const res = await joined.post('/api/invitations/accept').send({ token, password, displayName: 'New Grower' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ user: { email, role: 'grower' }, team: { name: expect.stringMatching(/Northlight/) } });
    expect((await joined.get('/api/families')).status).toBe(200);
    expect((await joined.post('/api/families').send({})).status).toBe(403);
    expect((await agent(ctx).post('/api/invitations/accept').send({ token, password, displayName: 'Again' })).status).toBe(400);
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
    const founder = agent(ctx);
    await founder.post('/api/auth/sign-up').send({ email: fresh('solo'), password, displayName: 'Solo', teamName: 'Solo lab' });
    const me = (await founder.get('/api/auth/me')).body;
    const demote = await founder.put(`/api/team/members/${me.user.id}/role`).send({ role: 'viewer' });
    expect(demote.status).toBe(409);
    expect((await founder.delete(`/api/team/members/${me.user.id}`)).status).toBe(409);
    // Invite a second member, promote them, and then the founder may step down.
    const email = fresh('deputy');
    await founder.post('/api/team/invitations').send({ email, role: 'physicist' });
    const deputy = agent(ctx);
    const joined = await deputy.post('/api/invitations/accept').send({ token: tokenIn((await mailTo(email)).text, '/join'), password, displayName: 'Deputy' });
    expect((await deputy.post('/api/families').send({ name: 'Deputy alloy', source: 'x', definition: { kind: 'constant', seebeck: 2e-4, sigma: 1e5, kappa: 1.5 } })).status).toBe(201);
    expect((await founder.put(`/api/team/members/${joined.body.user.id}/role`).send({ role: 'viewer' })).status).toBe(200);
    expect((await deputy.post('/api/families').send({ name: 'Deputy alloy 2', source: 'x', definition: { kind: 'constant', seebeck: 2e-4, sigma: 1e5, kappa: 1.5 } })).status).toBe(403);
    expect((await founder.put(`/api/team/members/${joined.body.user.id}/role`).send({ role: 'admin' })).status).toBe(200);
    expect((await founder.put(`/api/team/members/${me.user.id}/role`).send({ role: 'viewer' })).status).toBe(200);
    expect((await founder.post('/api/team/invitations').send({ email: fresh('late'), role: 'viewer' })).status).toBe(403);
  });
});
