import { agent, agentAt, mailTo, newTeam, openContext, type TestContext } from './context';

/** A member's own password and sessions: change the password (the current one required), sign out everywhere. */
let ctx: TestContext;
jest.setTimeout(120_000);
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });

/** A second device: signs in through the API as a person would. */
async function secondDevice(email: string, password: string) {
  const api = agentAt(ctx);
  expect((await api.post('/api/auth/sign-in').send({ email, password })).status).toBe(200);
  return api;
}

it('changing the password needs the current one, ends every other session, keeps this one, and mails the owner', async () => {
  const me = await newTeam(ctx, { displayName: 'Changer' });
  const other = await secondDevice(me.email, me.password);
  const wrong = await me.api.post('/api/auth/password').send({ currentPassword: 'not my password', newPassword: 'a brand new passphrase' });
  expect(wrong.status).toBe(400);
  expect(wrong.body.errors).toEqual([{ field: 'currentPassword', message: 'this is not your current password' }]);
  const short = await me.api.post('/api/auth/password').send({ currentPassword: me.password, newPassword: 'short' });
  expect(short.status).toBe(400);
  expect(short.body.errors[0].field).toBe('newPassword');
  // Nothing changed so far: the other device is still in.
  expect((await other.get('/api/auth/me')).status).toBe(200);

  expect((await me.api.post('/api/auth/password').send({ currentPassword: me.password, newPassword: 'a brand new passphrase' })).status).toBe(204);
  expect((await me.api.get('/api/auth/me')).status).toBe(200);
  expect((await other.get('/api/auth/me')).status).toBe(401);
  expect((await agentAt(ctx).post('/api/auth/sign-in').send({ email: me.email, password: me.password })).status).toBe(400);
  expect((await agentAt(ctx).post('/api/auth/sign-in').send({ email: me.email, password: 'a brand new passphrase' })).status).toBe(200);
  const mail = await mailTo(ctx, me.email, /Your Frostgrade password was changed/);
  expect(mail.text).toMatch(/changed while signed in[\s\S]*\/forgot-password/);
});

it('wrong current passwords are limited per account (8 in 15 minutes), so a stolen session is no password oracle', async () => {
  const me = await newTeam(ctx);
  const statuses: number[] = [];
  for (let i = 0; i < 9; i += 1) statuses.push((await me.api.post('/api/auth/password').send({ currentPassword: `guess ${i}`, newPassword: 'a brand new passphrase' })).status);
  expect(statuses).toEqual([...Array(8).fill(400), 429]);
});

it('signing out everywhere ends every session of the account, this one too', async () => {
  const me = await newTeam(ctx, { displayName: 'Leaver' });
  const other = await secondDevice(me.email, me.password);
  const res = await me.api.post('/api/auth/sign-out-everywhere');
  expect(res.status).toBe(204);
  expect(String(res.headers['set-cookie'])).toMatch(/frostgrade_session=;/);
  expect((await other.get('/api/auth/me')).status).toBe(401);
  expect((await agent(ctx).set('Cookie', me.cookie).get('/api/auth/me')).status).toBe(401);
  expect(await ctx.ds.query('SELECT 1 FROM user_session WHERE user_id = $1', [me.userId])).toEqual([]);
  // The password still works: signing out is not a lock-out.
  expect((await agentAt(ctx).post('/api/auth/sign-in').send({ email: me.email, password: me.password })).status).toBe(200);
});
