import { uniqueConflict, uniqueFields } from '../../server/http/unique-conflict';
import { agentAt, demo, eventually, fresh, openContext, signedIn, tokenIn, type TestContext } from './context';

let ctx: TestContext;
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });

const family = (name: string) => ({ name, source: 'race test', definition: { kind: 'constant', seebeck: 2e-4, sigma: 1e5, kappa: 1.5 } });

it('every unique index of the schema names the field it guards', async () => {
  const indexes: Array<{ name: string }> = await ctx.ds.query(`
    SELECT c.relname AS name FROM pg_index i JOIN pg_class c ON c.oid = i.indexrelid JOIN pg_class t ON t.oid = i.indrelid
    JOIN pg_namespace n ON n.oid = t.relnamespace
    WHERE n.nspname = 'public' AND i.indisunique AND NOT i.indisprimary AND t.relname <> 'schema_migration'`);
  expect(indexes.length).toBeGreaterThan(0);
  expect(indexes.map((i) => i.name).filter((name) => !(name in uniqueFields))).toEqual([]);
});

it('reads the index from a real unique violation, whether TypeORM wraps it or not', async () => {
  const lab = await signedIn(ctx, demo.physicist);
  const created = await lab.post('/api/families').send(family(`Index probe ${Date.now()}`));
  expect(created.status).toBe(201);
  const [row] = await ctx.ds.query('SELECT team_id, kind, created_by FROM material_family WHERE id = $1', [created.body.family.id]);
  const caught: unknown = await ctx.ds.query('INSERT INTO material_family (team_id, name, kind, created_by) VALUES ($1, upper($2), $3, $4)', [row.team_id, created.body.family.name, row.kind, row.created_by])
    .then(() => null, (err: unknown) => err);
  expect(uniqueConflict(caught)).toMatchObject({ field: 'name' });
  expect(uniqueConflict((caught as { driverError: unknown }).driverError)).toMatchObject({ field: 'name' });
  expect(uniqueConflict(new Error('something else'))).toBeNull();
});

it('two members creating the same family name at once: one 201, the others 409 naming `name`', async () => {
  const [a, b] = [await signedIn(ctx, demo.physicist), await signedIn(ctx, demo.admin)];
  for (let round = 0; round < 3; round += 1) {
    const name = `Race ${Date.now()} ${round}`;
    const answers = await Promise.all([a, b, a, b].map((api) => api.post('/api/families').send(family(name))));
    expect(answers.map((r) => r.status).sort()).toEqual([201, 409, 409, 409]);
    for (const r of answers.filter((x) => x.status === 409)) {
      expect(r.body).toMatchObject({ name: 'Conflict', errors: [{ field: 'name' }] });
    }
  }
});

it('confirming two sign-ups of one address at once: one account, the other answers naming `email` or `token`, never a 500', async () => {
  const email = fresh('twin');
  for (const i of [0, 1, 2]) {
    expect((await agentAt(ctx).post('/api/auth/sign-up').send({ email, displayName: `Twin ${i}`, teamName: `Twin lab ${i}` })).status).toBe(202);
  }
  const mails = await eventually(async () => {
    const rows: Array<{ text: string }> = await ctx.ds.query(`SELECT text FROM captured_mail WHERE $1 = ANY(mail_to) AND subject LIKE 'Finish creating%'`, [email]);
    return rows.length === 3 ? rows : undefined;
  });
  const answers = await Promise.all(mails.map((m) => agentAt(ctx).post('/api/auth/sign-up/confirm').send({ token: tokenIn(m.text, '/confirm-sign-up'), password: 'a long enough passphrase' })));
  expect(answers.filter((r) => r.status === 201)).toHaveLength(1);
  for (const r of answers.filter((x) => x.status !== 201)) {
    expect([400, 409]).toContain(r.status);
    expect(['email', 'token']).toContain(r.body.errors[0].field);
  }
  expect(await ctx.ds.query('SELECT count(*)::int AS n FROM app_user WHERE email = $1', [email])).toEqual([{ n: 1 }]);
});
