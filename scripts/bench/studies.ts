/**
 * Studies bench: recomputing a study of 200 model blocks on the server (< 100 ms). Measures the
 * pure part of a save (sanitise the document, resolve links, compute every block, scenarios and
 * charts) and, when DATABASE_URL points at a migrated database, the whole PUT through the app.
 */
import { randomBytes } from 'node:crypto';
import { sanitiseDocument } from '../../api/routes/studies/document-sanitiser';
import { computeAll } from '../../api/routes/studies/save-document';
import { BENCH_REGISTER, benchDocument } from './study-bench-document';
import type { BenchRow, BenchSuite } from './types';

async function medianMs(run: () => unknown, repeats: number): Promise<number> {
  for (let i = 0; i < 10; i++) await run();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const start = performance.now();
    await run();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

const row = (what: string, measured: number, limit: number): BenchRow => ({ area: 'studies', what, measured, unit: 'ms', target: `< ${limit} ms`, ok: measured < limit });

/** The whole PUT /api/studies/:id/document through createApp against the database. */
async function throughTheApp(document: Record<string, unknown>): Promise<BenchRow[]> {
  const [{ default: request }, { createApp }, { loadConfig }, { createContext }, { hashPassword }, schema, { eq }] = await Promise.all([
    import('supertest'),
    import('../../api/app'),
    import('../../api/config'),
    import('../../api/context'),
    import('../../api/auth/passwords'),
    import('../../api/db/schema/index'),
    import('drizzle-orm'),
  ]);
  const env = { SESSION_SECRET: randomBytes(24).toString('hex'), S3_BUCKET: 'bench', SMTP_URL: 'smtp://127.0.0.1:1', ...process.env };
  const ctx = createContext(loadConfig(env));
  const email = `bench-${randomBytes(4).toString('hex')}@example.test`;
  const now = new Date();
  const [u] = await ctx.db.insert(schema.users).values({ email, name: 'Bench consultant', role: 'consultant', passwordHash: await hashPassword('bench-password-123'), status: 'active', createdAt: now });
  const [e] = await ctx.db.insert(schema.engagements).values({ name: 'Bench: regional service network', clientName: 'Bench', description: '', createdAt: now, updatedAt: now });
  try {
    await ctx.db.insert(schema.memberships).values({ engagementId: e.insertId, userId: u.insertId, addedAt: now });
    const ids = new Map<number, number>();
    for (const a of BENCH_REGISTER) {
      const [r] = await ctx.db.insert(schema.assumptions).values({ engagementId: e.insertId, name: a.name, value: a.value, unit: a.unit, sourceKind: 'judgement', createdAt: now, updatedAt: now });
      ids.set(a.id, r.insertId);
    }
    const linked = JSON.parse(JSON.stringify(document).replace(/"assumption":(\d+)/g, (_m, id: string) => `"assumption":${ids.get(Number(id))}`)) as Record<string, unknown>;
    const agent = request.agent(createApp(ctx));
    const csrf = ['x-sojourn-csrf', '1'] as const;
    await agent.post('/api/auth/sign-in').set(...csrf).send({ email, password: 'bench-password-123' }).expect(200);
    const created = await agent.post(`/api/engagements/${e.insertId}/studies`).set(...csrf).send({ title: 'Bench study' }).expect(201);
    let version = created.body.study.version as number;
    const put = async (doc: Record<string, unknown>): Promise<void> => {
      const res = await agent.put(`/api/studies/${created.body.study.id}/document`).set(...csrf).send({ document: doc, baseVersion: version });
      if (res.status !== 200) throw new Error(`PUT answered ${res.status}: ${JSON.stringify(res.body).slice(0, 300)}`);
      version = res.body.study.version;
    };
    // Every block's config differs from the last save: all 200 rows and their links are rewritten.
    let round = 0;
    const text = JSON.stringify(linked);
    const allChanged = await medianMs(() => put(JSON.parse(text.replaceAll('"title":"Line ', `"title":"Line ${++round}.`)) as Record<string, unknown>), 15);
    // The common save while writing: text changed, every block recomputed but none rewritten.
    const textOnly = await medianMs(() => put(JSON.parse(text.replace('busiest hour', `busiest hour (${++round})`)) as Record<string, unknown>), 15);
    // The target is the recompute's (rows above); a whole save adds the HTTP round trip, storing
    // about 380 kB of block rows and encoding the answer, shown beside it for what users wait.
    const informative = (what: string, measured: number): BenchRow => ({ area: 'studies', what: `${what} (informative)`, measured, unit: 'ms', target: 'n/a', ok: true });
    return [
      informative('PUT document, 200 blocks all changed, through the app and MariaDB', allChanged),
      informative('PUT document, 200 blocks, text edit only, through the app and MariaDB', textOnly),
    ];
  } finally {
    await ctx.db.delete(schema.studies).where(eq(schema.studies.engagementId, e.insertId));
    await ctx.db.delete(schema.engagements).where(eq(schema.engagements.id, e.insertId));
    await ctx.db.delete(schema.users).where(eq(schema.users.id, u.insertId));
    await ctx.close();
  }
}

const suite: BenchSuite = async () => {
  const document = benchDocument(200);
  const register = new Map(BENCH_REGISTER.map((a) => [a.id, a]));
  const clean = sanitiseDocument(document);
  const rows = [
    row('sanitise a 200-block document', await medianMs(() => sanitiseDocument(document), 30), 30),
    row('recompute 200 blocks (links, scenarios, charts)', await medianMs(() => computeAll(clean.blocks, register), 30), 100),
    row('sanitise + recompute, 200 blocks (the save before its transaction)', await medianMs(() => computeAll(sanitiseDocument(document).blocks, register), 30), 100),
  ];
  if (process.env.DATABASE_URL) rows.push(...(await throughTheApp(document)));
  else rows.push({ area: 'studies', what: 'PUT document through the app: skipped, no DATABASE_URL (run under npm start or set it)', measured: NaN, unit: '', target: '< 100 ms', ok: true });
  return rows;
};

export default suite;
