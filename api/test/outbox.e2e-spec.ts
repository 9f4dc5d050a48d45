import { EntityManager } from '@mikro-orm/postgresql';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { layoutMessage } from '../src/notifications/messages/customer-message';
import { NotificationsService } from '../src/notifications/notifications.service';
import { outboxJobId } from '../src/notifications/outbox-key';
import { DEMO_WORKSHOP_CARD } from '../src/database/seeders/demo-workshop.seeder';
import { productId, vehicleModelId } from './support/catalogue';
import { MailDevCatcher } from './support/maildev-catcher';
import { registerCustomer, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

const MESSAGES = 20;

async function until<T>(what: string, probe: () => Promise<T | null>, timeoutMs = 45_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (value !== null) return value;
    if (Date.now() > deadline) throw new Error(`Timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

describe('e-mail outbox', () => {
  let testApp: TestApp;
  let customer: Session & { email: string; id: string };
  let strata: string;
  let alignment: string;
  /** The stack's own catcher, read through its REST API. */
  const catcher = new MailDevCatcher();

  beforeAll(async () => {
    await catcher.start();
    testApp = await startTestApp({ smtpUrl: catcher.smtpUrl });
    customer = await registerCustomer(testApp);
    strata = await vehicleModelId(testApp.db, 'Vantrel', 'Strata', 'SR dual cab');
    alignment = await productId(testApp.db, 'KW-SVC-ALIGN');
  });

  afterAll(async () => {
    await testApp.close();
    await catcher.close();
  });

  async function caughtFor(email: string) {
    return (await catcher.emails()).filter((mail) =>
      mail.to.some((to) => to.address.toLowerCase() === email.toLowerCase()),
    );
  }

  async function jobsTo(email: string) {
    const result = await testApp.db.query<{ id: string; state: string; retry_count: number }>(
      `select id, state, retry_count from pgboss.job where name = 'customer-mail' and data->>'to' = $1
       union all
       select id, state, retry_count from pgboss.archive where name = 'customer-mail' and data->>'to' = $1`,
      [email],
    );
    return result.rows;
  }

  it('delivers every message queued while the mail catcher was down, each exactly once', async () => {
    await catcher.stop();
    for (let index = 0; index < MESSAGES; index += 1) {
      const response = await customer.agent
        .post('/api/quotes')
        .set('x-csrf-token', customer.csrfToken)
        .send({
          vehicleModelId: strata,
          uses: ['daily'],
          constantLoadKg: 0,
          items: [{ productId: alignment, quantity: 1 }],
        });
      expect(response.status, JSON.stringify(response.body)).toBe(201);
    }
    // Every save queued its message with the change, before any delivery.
    expect(await jobsTo(customer.email)).toHaveLength(MESSAGES);
    // The worker tries, the server refuses, the job waits for its retry.
    await until('a failed delivery', async () =>
      (await jobsTo(customer.email)).some((job) => job.retry_count > 0) ? true : null,
    );

    await catcher.start();
    expect(await caughtFor(customer.email)).toHaveLength(0);
    await until(
      'every message in the catcher',
      async () => ((await caughtFor(customer.email)).length >= MESSAGES ? true : null),
      60_000,
    );
    // Every job finished: nothing is left to deliver (so no second copy can come later).
    await until('every job completed', async () => {
      const jobs = await jobsTo(customer.email);
      return jobs.length === MESSAGES && jobs.every((job) => job.state === 'completed')
        ? jobs
        : null;
    });
    const received = await caughtFor(customer.email);
    expect(received).toHaveLength(MESSAGES);
    const ids = new Set(received.map((mail) => mail.headers['message-id']));
    expect(ids.size).toBe(MESSAGES);
    // Each Message-ID is made from the job's own id, on the workshop's mail domain.
    const jobIds = (await jobsTo(customer.email)).map(
      (job) => `<msg-${job.id}@kestrelmere.example>`,
    );
    expect([...ids].sort()).toEqual(jobIds.sort());
    for (const mail of received) {
      expect(mail.subject).toMatch(/^Your quote Q-\d{6} v1 from Kestrelmere 4x4 & Tyre$/);
      expect(mail.text).toContain(DEMO_WORKSHOP_CARD.phone);
      expect(mail.html).toContain('Kestrelmere 4x4 &amp; Tyre');
    }
  }, 120_000);

  it('queues nothing when the change rolls back, and a cause only once', async () => {
    const notifications = testApp.app.get(NotificationsService);
    const rootEm = testApp.app.get(EntityManager);
    const content = layoutMessage({
      subject: 'Outbox check',
      customerName: 'Outbox check',
      lead: ['A message of the outbox test.'],
      facts: [],
      closing: [],
      workshop: DEMO_WORKSHOP_CARD,
    });
    const rolledBack = `outbox-test:rolled-back:${customer.id}`;
    let seenInside = -1;
    await expect(
      rootEm.fork().transactional(async (em) => {
        expect(
          await notifications.queue(em, { causeKey: rolledBack, to: customer.email, content }),
        ).toBe(true);
        const inside = await em
          .getConnection()
          .execute<{ count: string }[]>(
            'select count(*) from pgboss.job where id = ?',
            [outboxJobId(rolledBack)],
            'all',
            em.getTransactionContext(),
          );
        seenInside = Number(inside[0].count);
        throw new Error('the change is refused');
      }),
    ).rejects.toThrow('the change is refused');
    expect(seenInside).toBe(1);
    const after = await testApp.db.query('select 1 from pgboss.job where id = $1', [
      outboxJobId(rolledBack),
    ]);
    expect(after.rows).toHaveLength(0);

    // Outside a transaction it refuses: a message must go with its change.
    await expect(
      notifications.queue(rootEm.fork(), {
        causeKey: 'outbox-test:x',
        to: customer.email,
        content,
      }),
    ).rejects.toThrow(/inside the change/);

    const once = `outbox-test:once:${customer.id}`;
    const queue = () =>
      rootEm
        .fork()
        .transactional((em) =>
          notifications.queue(em, { causeKey: once, to: customer.email, content }),
        );
    expect(await queue()).toBe(true);
    expect(await queue()).toBe(false);
    const rows = await testApp.db.query('select 1 from pgboss.job where id = $1', [
      outboxJobId(once),
    ]);
    expect(rows.rows).toHaveLength(1);
  });
});
