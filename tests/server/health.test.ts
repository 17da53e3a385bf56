import request from 'supertest';
import { healthResponseSchema } from '../../shared/api';
import { createApp } from '../../server/http/app';
import { createMailer } from '../../server/mail/mailer';
import { openContext, type TestContext } from './context';

let ctx: TestContext;
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });

describe('GET /api/health', () => {
  it('reports database, queue, worker and mail as up when the test stack runs', async () => {
    const res = await request(ctx.app).get('/api/health');
    expect(res.status).toBe(200);
    const body = healthResponseSchema.parse(res.body);
    expect(body.status).toBe('ok');
    for (const check of Object.values(body.checks)) expect(check.ok).toBe(true);
    expect(body.checks.queue.detail).toContain('system-probe');
  });

  it('answers 503 and names the failing dependency when the SMTP server is unreachable', async () => {
    const deadMailer = createMailer({ ...ctx.env, smtp: { host: '127.0.0.1', port: 9 } });
    const app = createApp({ env: ctx.env, ds: ctx.ds, boss: ctx.boss, mailer: deadMailer, auth: ctx.auth, version: 'test' });
    const res = await request(app).get('/api/health');
    deadMailer.close();
    expect(res.status).toBe(503);
    const body = healthResponseSchema.parse(res.body);
    expect(body.status).toBe('degraded');
    expect(body.checks.mail.ok).toBe(false);
    expect(body.checks.database.ok).toBe(true);
  });

  it('calls the worker down when its newest heartbeat is stale', async () => {
    const app = createApp({ env: { ...ctx.env, heartbeatSeconds: 0.0001 }, ds: ctx.ds, boss: ctx.boss, mailer: ctx.mailer, auth: ctx.auth, version: 'test' });
    const body = healthResponseSchema.parse((await request(app).get('/api/health')).body);
    expect(body.checks.worker.ok).toBe(false);
    expect(body.checks.worker.detail).toMatch(/s ago/);
  });
});
