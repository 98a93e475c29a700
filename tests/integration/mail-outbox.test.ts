import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { mailOutbox } from '../../api/db/schema/index';
import { startTestApp, unique, type TestApp } from './support/test-app';
import { mailFor } from './support/mailbox';

let t: TestApp;
const smtpAccepts = (accept: boolean) =>
  fetch(`${process.env.MAIL_FAKE_URL}/control`, { method: 'POST', body: JSON.stringify({ accept }) });

beforeAll(() => {
  t = startTestApp();
});
afterEach(() => smtpAccepts(true));
afterAll(() => t.close());

describe('the mail outbox', () => {
  it('keeps a message through an SMTP outage and delivers it once the relay is back', async () => {
    await smtpAccepts(false);
    const to = unique('outage');
    await t.ctx.outbox.enqueue({ to, subject: 'Outage check', text: 'held until the relay answers' });
    await t.ctx.outbox.kick();
    const [held] = await t.ctx.db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, to));
    // The running app's own dispatcher drains the same table, so it may have tried as well.
    expect(held).toMatchObject({ status: 'pending' });
    expect(held!.attempts).toBeGreaterThanOrEqual(1);
    expect(held!.lastError).toMatch(/451|unavailable/i);
    expect(await mailFor(to)).toHaveLength(0);

    await smtpAccepts(true);
    // Make the retry due now instead of waiting out the backoff.
    await t.ctx.db.update(mailOutbox).set({ nextAttemptAt: new Date() }).where(eq(mailOutbox.toAddress, to));
    let sent: typeof held;
    for (let i = 0; i < 50; i++) {
      await t.ctx.outbox.kick();
      [sent] = await t.ctx.db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, to));
      if (sent?.status === 'sent') break;
      await new Promise((r) => setTimeout(r, 200));
    }
    expect(sent!.status).toBe('sent');
    expect(sent!.attempts).toBeGreaterThanOrEqual(2);
    expect((await mailFor(to)).map((m) => m.subject)).toEqual(['Outage check']);
  });

  it('sends one message for one dedupe key, however often the event is queued', async () => {
    const to = unique('dedupe');
    await Promise.all(Array.from({ length: 10 }, () => t.ctx.outbox.enqueue({ to, subject: 'Once', text: 'only once' }, `test:${to}`)));
    await t.ctx.outbox.kick();
    await t.ctx.outbox.kick();
    expect(await t.ctx.db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, to))).toHaveLength(1);
    expect(await mailFor(to)).toHaveLength(1);
  });
});
