import request from 'supertest';
import { outboxResponseSchema } from '../../shared/api';
import { WorkerHeartbeat } from '../../server/db/entities';
import { queues } from '../../server/queue/queues';
import { demo, eventually, openContext, signedIn, type TestContext } from './context';

let ctx: TestContext;
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });

it('a job sent to the queue is worked by the separate worker process', async () => {
  const id = await ctx.boss.send(queues.probe, { sentAt: new Date().toISOString() });
  expect(id).toBeTruthy();
  const job = await eventually(async () => {
    const j = await ctx.boss.getJobById<{ sentAt: string }>(queues.probe, id!);
    return j?.state === 'completed' ? j : undefined;
  }, 20);
  const output = job.output as { workerId: string };
  // The worker that did it is a live process with a heartbeat row of its own.
  const beat = await ctx.ds.getRepository(WorkerHeartbeat).findOneBy({ workerId: output.workerId });
  expect(beat?.pid).not.toBe(process.pid);
  expect(beat?.jobsDone).toBeGreaterThanOrEqual(1);
});

it('mail sent through nodemailer is caught by the local SMTP catcher and shown in the outbox', async () => {
  const subject = `Probe ${Date.now()}`;
  await ctx.mailer.send({ to: [demo.grower], subject, text: 'Zone 3 measured: 2.1e19 cm^-3.' });
  const found = await eventually(async () => {
    const body = outboxResponseSchema.parse((await (await signedIn(ctx, demo.admin)).get('/api/outbox')).body);
    return body.messages.find((m) => m.subject === subject);
  });
  expect(found.to).toEqual([demo.grower]);
  expect(found.text).toContain('2.1e19');
  // Another team's admin never reads it: captured mail carries sign-in links.
  const theirs = outboxResponseSchema.parse((await (await signedIn(ctx, demo.otherTeamAdmin)).get('/api/outbox')).body);
  expect(theirs.messages.map((m) => m.subject)).not.toContain(subject);
});

it('hides the outbox where no catcher runs (production)', async () => {
  const { createApp } = await import('../../server/http/app');
  const app = createApp({ env: { ...ctx.env, mailCatcher: false, production: true }, ds: ctx.ds, boss: ctx.boss, mailer: ctx.mailer, auth: ctx.auth, version: 'test' });
  const [row] = await ctx.ds.query('SELECT id FROM app_user WHERE email = $1', [demo.admin]);
  const session = await ctx.auth.createSession(row.id, {});
  const res = await request(app).get('/api/outbox').set('Cookie', ctx.auth.createSessionCookie(session.id).serialize());
  expect(res.status).toBe(404);
});
