import { DateTime } from 'luxon';
import { PDFParse } from 'pdf-parse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formatCents } from '../src/pricing/cents';
import { productIds, vehicleModelId } from './support/catalogue';
import { registerCustomer, signInAs, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

interface PricedLine {
  kind: string;
  description: string;
  amountCents: number;
  sku?: string;
  labourMinutes?: number;
}
interface Version {
  id: string;
  number: number;
  state: string;
  revisionReason: string | null;
  lines: Array<{ sku: string; quantity: number; labourMinutes: number }>;
  price: {
    lines: PricedLine[];
    totalCents: number;
    depositCents: number;
    breakdown: Record<string, number>;
  };
  pdfUrl: string;
}
interface Quote {
  id: string;
  number: number;
  reference: string;
  versions: Version[];
}

/** Extracted with a general-purpose PDF text reader; runs of white space made one space. */
async function pdfText(bytes: Buffer): Promise<string> {
  const parser = new PDFParse({ data: bytes });
  const result = await parser.getText();
  await parser.destroy();
  return result.text.replace(/\s+/g, ' ');
}

const REASON =
  'The tyre you chose is short: one more for a matching spare, and the kit needs longer.';

/**
 * The desk revises a customer's quote over HTTP: a new version priced again (labour per line and
 * a workshop discount), the old one superseded, the customer e-mailed the PDF and the link; only
 * that customer may answer, and only the newest version.
 */
describe('quotes: revisions by the desk', () => {
  let testApp: TestApp;
  let customer: Session & { id: string; email: string };
  let other: Session & { id: string; email: string };
  let desk: Session;
  let tech: Session;
  let strata: string;
  let kit: string;
  let wheel: string;
  let tyre: string;

  const post = (session: Session, url: string, body: object = {}) =>
    session.agent.post(url).set('x-csrf-token', session.csrfToken).send(body);

  function packageWith(items: object[], extra: Record<string, unknown> = {}) {
    return { vehicleModelId: strata, uses: ['touring'], constantLoadKg: 0, items, ...extra };
  }

  async function customerQuote(): Promise<Quote> {
    const response = await post(
      customer,
      '/api/quotes',
      packageWith([
        { productId: kit, quantity: 1 },
        { productId: wheel, quantity: 4 },
        { productId: tyre, quantity: 4 },
      ]),
    );
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    return response.body as Quote;
  }

  const revision = (extra: Record<string, unknown> = {}) =>
    packageWith(
      [
        { productId: kit, quantity: 1, labourMinutes: 330 },
        { productId: wheel, quantity: 4 },
        { productId: tyre, quantity: 5 },
      ],
      { discountCents: 5000, reason: REASON, ...extra },
    );

  async function versionCount(quoteId: string): Promise<number> {
    const rows = await testApp.db.query('select count(*) from quote_version where quote_id = $1', [
      quoteId,
    ]);
    return Number(rows.rows[0].count);
  }

  /**
   * Holds a start for the quote version: the first one offered on or after `from` (a local date)
   * or, without it, the first more than two days ahead. Returns the booking as the API gave it.
   */
  async function holdFor(versionId: string, from?: string) {
    const availability = await customer.agent
      .get('/api/availability')
      .query({ quoteVersionId: versionId, ...(from ? { from, days: 7 } : {}) })
      .expect(200);
    const start = (
      availability.body as { days: Array<{ starts: Array<{ startUtc: string }> }> }
    ).days
      .flatMap((day) => day.starts)
      .find(
        (option) => from !== undefined || Date.parse(option.startUtc) > Date.now() + 48 * 3600_000,
      );
    expect(start, 'a start is offered').toBeDefined();
    const held = await post(customer, '/api/bookings', {
      quoteVersionId: versionId,
      start: start!.startUtc,
    });
    expect(held.status, JSON.stringify(held.body)).toBe(201);
    return held.body as {
      id: string;
      startUtc: string;
      endUtc: string;
      segments: Array<{ bayKind: string; minutes: number }>;
    };
  }

  beforeAll(async () => {
    testApp = await startTestApp();
    customer = await registerCustomer(testApp);
    other = await registerCustomer(testApp);
    desk = await signInAs(testApp, 'desk');
    tech = await signInAs(testApp, 'tech');
    strata = await vehicleModelId(testApp.db, 'Vantrel', 'Strata', 'SR dual cab');
    [kit, wheel, tyre] = await productIds(testApp.db, [
      'BR-STR-50-L',
      'IW-STK-1780-P20',
      'QD-TG-2657017',
    ]);
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('saves the next version priced again, supersedes the old one and e-mails the PDF and the link', async () => {
    const quote = await customerQuote();
    const before = quote.versions[0];
    const kitLabourBefore = before.price.lines.find(
      (line) => line.kind === 'labour' && line.sku === 'BR-STR-50-L',
    );

    const previewed = await post(desk, `/api/quotes/${quote.id}/revisions/preview`, revision());
    expect(previewed.status, JSON.stringify(previewed.body)).toBe(200);
    expect(await versionCount(quote.id)).toBe(1);

    const mailsBefore = testApp.mailbox.countTo(customer.email);
    const saved = await post(desk, `/api/quotes/${quote.id}/revisions`, revision());
    expect(saved.status, JSON.stringify(saved.body)).toBe(201);
    const revised = saved.body as Quote;
    expect(revised.versions.map((version) => [version.number, version.state])).toEqual([
      [1, 'superseded'],
      [2, 'sent'],
    ]);
    const v2 = revised.versions[1];
    expect(v2.revisionReason).toBe(REASON);
    expect(v2.price.totalCents).toBe(
      (previewed.body as { price: { totalCents: number } }).price.totalCents,
    );
    expect(v2.lines.find((line) => line.sku === 'BR-STR-50-L')?.labourMinutes).toBe(330);
    expect(v2.lines.find((line) => line.sku === 'QD-TG-2657017')?.quantity).toBe(5);

    const kitLabour = v2.price.lines.find(
      (line) => line.kind === 'labour' && line.sku === 'BR-STR-50-L',
    );
    // Common practice (no published source): labour is charged as minutes × the hourly rate / 60;
    // the demo workshop's rate is $140.00 an hour, so 330 minutes are $770.00.
    expect(kitLabour).toMatchObject({ labourMinutes: 330, amountCents: 77000 });
    expect(kitLabourBefore?.amountCents).not.toBe(77000);
    expect(v2.price.lines.at(-1)).toMatchObject({ kind: 'workshop-discount', amountCents: -5000 });
    expect(v2.price.breakdown.workshopDiscountCents).toBe(-5000);

    const mail = await testApp.mailbox.waitFor(customer.email, 0, 15_000, (message) =>
      message.subject.startsWith(`Revised quote ${quote.reference} v2`),
    );
    expect(testApp.mailbox.countTo(customer.email)).toBeGreaterThan(mailsBefore);
    const total = formatCents(v2.price.totalCents);
    expect(mail.text).toContain(total);
    expect(mail.text).toContain(`was ${formatCents(before.price.totalCents)}`);
    expect(mail.text).toContain(REASON);
    expect(mail.html).toContain(total);
    const link = `/account/quotes/${quote.reference}/versions/2/compare`;
    expect(mail.text).toContain(link);
    expect(mail.html).toContain(`href="http://127.0.0.1:4400${link}"`);
    // No raw ids anywhere in the words or the link.
    expect(mail.text).not.toMatch(/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/);

    const pdf = mail.attachments.find((attachment) => attachment.contentType === 'application/pdf');
    expect(pdf?.filename).toBe(`quote-${quote.reference}-v2.pdf`);
    const text = await pdfText(pdf!.content);
    expect(text).toContain(total);
    expect(text).toContain('Workshop discount');
    expect(text).toContain(`Revised: ${REASON}`);
  });

  it('lets only that customer accept, only the newest version', async () => {
    const quote = await customerQuote();
    const saved = await post(desk, `/api/quotes/${quote.id}/revisions`, revision());
    expect(saved.status, JSON.stringify(saved.body)).toBe(201);

    await post(other, `/api/quotes/${quote.id}/versions/2/accept`).expect(404);
    await post(desk, `/api/quotes/${quote.id}/versions/2/accept`).expect(403);
    const old = await post(customer, `/api/quotes/${quote.id}/versions/1/accept`).expect(409);
    expect((old.body as { message: string }).message).toContain('replaced by version 2');

    const accepted = await post(customer, `/api/quotes/${quote.id}/versions/2/accept`).expect(200);
    expect((accepted.body as Quote).versions.map((version) => version.state)).toEqual([
      'superseded',
      'accepted',
    ]);
    await post(customer, `/api/quotes/${quote.id}/versions/1/accept`).expect(409);
    await post(customer, `/api/quotes/${quote.id}/versions/2/accept`).expect(409);
  });

  it('moves a held booking to the accepted revision and re-plans its bay time', async () => {
    const quote = await customerQuote();
    // The first start of a day five weeks out, which no other spec books: the hour more on the
    // hoist fits after it, so the booking is re-planned at the same start (not flagged to move).
    const from = DateTime.now().setZone('Australia/Sydney').plus({ days: 35 }).toISODate()!;
    const before = await holdFor(quote.versions[0].id, from);

    // 60 more minutes on the kit (the hoist bay).
    await post(desk, `/api/quotes/${quote.id}/revisions`, revision()).expect(201);
    const waiting = (await customer.agent.get(`/api/bookings/${before.id}`).expect(200)).body as {
      quote: { versionNumber: number; latestVersionNumber: number };
      events: Array<{ kind: string; detail: string; actor: { role: string } | null }>;
    };
    expect(waiting.quote).toMatchObject({ versionNumber: 1, latestVersionNumber: 2 });
    expect(waiting.events.at(-1)).toMatchObject({ kind: 'revision-sent', actor: { role: 'desk' } });
    expect(waiting.events.at(-1)?.detail).toContain(REASON);
    await post(customer, `/api/quotes/${quote.id}/versions/2/accept`).expect(200);

    const after = (await customer.agent.get(`/api/bookings/${before.id}`).expect(200)).body as {
      startUtc: string;
      endUtc: string;
      quote: { versionNumber: number };
      needsMove: { reason: string } | null;
      segments: Array<{ bayKind: string; minutes: number }>;
      events: Array<{ kind: string; detail: string }>;
    };
    expect(after.quote.versionNumber).toBe(2);
    expect(after.needsMove).toBeNull();
    expect(after.events.at(-1)?.kind).toBe('re-planned');
    expect(after.startUtc).toBe(before.startUtc);
    expect(Date.parse(after.endUtc)).toBeGreaterThan(Date.parse(before.endUtc));
    const hoist = (booking: { segments: Array<{ bayKind: string; minutes: number }> }) =>
      booking.segments.find((segment) => segment.bayKind === 'hoist')?.minutes ?? 0;
    // The kit's hour more, and the fifth tyre's mounting at the workshop's minutes per wheel.
    const perWheel = (
      await testApp.db.query<{ minutes: number }>(
        'select fitting_minutes_per_wheel as minutes from workshop limit 1',
      )
    ).rows[0].minutes;
    expect(hoist(after) - hoist(before)).toBe(60 + perWheel);
    // Once the work has started, the quote is closed to revisions (409), nothing written.
    await testApp.db.query(`update booking set state = 'in-progress' where id = $1`, [before.id]);
    const refused = await post(desk, `/api/quotes/${quote.id}/revisions`, revision()).expect(409);
    expect((refused.body as { message: string }).message).toContain('in progress');
    expect(await versionCount(quote.id)).toBe(2);
    await testApp.db.query(`update booking set state = 'held' where id = $1`, [before.id]);
    await post(customer, `/api/bookings/${before.id}/cancel`).expect(200);
  });

  it('notes a declined revision in the booking, which stays on its version', async () => {
    const quote = await customerQuote();
    const booking = await holdFor(quote.versions[0].id);
    const bookingId = booking.id;
    await post(desk, `/api/quotes/${quote.id}/revisions`, revision()).expect(201);
    await post(customer, `/api/quotes/${quote.id}/versions/2/decline`).expect(200);
    const after = (await customer.agent.get(`/api/bookings/${bookingId}`).expect(200)).body as {
      startUtc: string;
      quote: { versionNumber: number; latestVersionState: string };
      events: Array<{ kind: string; detail: string; actor: { role: string } | null }>;
    };
    expect(after.quote).toMatchObject({ versionNumber: 1, latestVersionState: 'declined' });
    expect(after.startUtc).toBe(booking.startUtc);
    expect(after.events.map((event) => event.kind).slice(-2)).toEqual([
      'revision-sent',
      'revision-declined',
    ]);
    expect(after.events.at(-1)).toMatchObject({ actor: { role: 'customer' } });
    expect(after.events.at(-1)?.detail).toBe(
      `The customer declined quote ${quote.reference} v2; the booking stays on v1.`,
    );
    await post(customer, `/api/bookings/${bookingId}/cancel`).expect(200);
  });

  it('replaces an open deposit page of the old amount after a revision is accepted', async () => {
    const alignment = (
      await testApp.db.query<{ id: string }>("select id from product where sku = 'KW-SVC-ALIGN'")
    ).rows[0].id;
    const saved = await post(
      customer,
      '/api/quotes',
      packageWith([{ productId: alignment, quantity: 1 }]),
    );
    expect(saved.status, JSON.stringify(saved.body)).toBe(201);
    const quote = saved.body as Quote;
    const booking = await holdFor(quote.versions[0].id);
    const bookingId = booking.id;
    const first = await post(customer, `/api/bookings/${bookingId}/deposit-checkout`).expect(201);

    const revised = await post(
      desk,
      `/api/quotes/${quote.id}/revisions`,
      packageWith(
        [
          { productId: alignment, quantity: 1 },
          { productId: tyre, quantity: 4 },
        ],
        { reason: 'Four new tyres as we discussed on the phone.' },
      ),
    );
    expect(revised.status, JSON.stringify(revised.body)).toBe(201);
    const v2 = (revised.body as Quote).versions[1];
    expect(v2.price.depositCents).toBeGreaterThan(quote.versions[0].price.depositCents);
    await post(customer, `/api/quotes/${quote.id}/versions/2/accept`).expect(200);

    const second = await post(customer, `/api/bookings/${bookingId}/deposit-checkout`).expect(201);
    expect((second.body as { checkoutUrl: string }).checkoutUrl).not.toBe(
      (first.body as { checkoutUrl: string }).checkoutUrl,
    );
    const payments = await testApp.db.query<{ status: string; amount_cents: number }>(
      "select status, amount_cents from payment where booking_id = $1 and kind = 'deposit' order by attempt",
      [bookingId],
    );
    expect(payments.rows).toEqual([
      { status: 'expired', amount_cents: quote.versions[0].price.depositCents },
      { status: 'open', amount_cents: v2.price.depositCents },
    ]);
    await post(customer, `/api/bookings/${bookingId}/cancel`).expect(200);
  });

  it('is refused for the customer and the technician, and for another quote id (404)', async () => {
    const quote = await customerQuote();
    await post(customer, `/api/quotes/${quote.id}/revisions`, revision()).expect(403);
    await post(tech, `/api/quotes/${quote.id}/revisions`, revision()).expect(403);
    await post(customer, `/api/quotes/${quote.id}/revisions/preview`, revision()).expect(403);
    await post(
      desk,
      '/api/quotes/00000000-0000-4000-8000-000000000000/revisions',
      revision(),
    ).expect(404);
    expect(await versionCount(quote.id)).toBe(1);
  });

  it('refuses bad input field by field and writes nothing', async () => {
    const quote = await customerQuote();
    const cases: Array<[Record<string, unknown>, string]> = [
      [{ reason: 'no' }, 'reason'],
      [{ reason: undefined }, 'reason'],
      [{ discountCents: 99_000_000 }, 'discountCents'],
      [{ discountCents: 12.5 }, 'discountCents'],
      [{ discountCents: 9_000_000 }, 'discountCents'],
    ];
    for (const [change, field] of cases) {
      const response = await post(desk, `/api/quotes/${quote.id}/revisions`, revision(change));
      expect(response.status, JSON.stringify(response.body)).toBe(400);
      expect(Object.keys((response.body as { fieldErrors: object }).fieldErrors)).toContain(field);
    }
    const labour = await post(
      desk,
      `/api/quotes/${quote.id}/revisions`,
      packageWith([{ productId: kit, quantity: 1, labourMinutes: 5000 }], { reason: REASON }),
    );
    expect(labour.status).toBe(400);
    expect(Object.keys((labour.body as { fieldErrors: object }).fieldErrors)).toContain(
      'items[0].labourMinutes',
    );
    const otherModel = (
      await testApp.db.query<{ id: string }>(
        'select id from vehicle_model where id <> $1 order by id limit 1',
        [strata],
      )
    ).rows[0].id;
    const wrongVehicle = await post(
      desk,
      `/api/quotes/${quote.id}/revisions`,
      revision({ vehicleModelId: otherModel }),
    );
    expect(wrongVehicle.status).toBe(400);
    expect(Object.keys((wrongVehicle.body as { fieldErrors: object }).fieldErrors)).toEqual([
      'vehicleModelId',
    ]);
    expect(await versionCount(quote.id)).toBe(1);
    const states = await customer.agent.get(`/api/quotes/${quote.id}`).expect(200);
    expect((states.body as Quote).versions.map((version) => version.state)).toEqual(['sent']);
  });
});
