import { DateTime } from 'luxon';
import request from 'supertest';
import type Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HoldSweeperService } from '../src/bookings/hold-sweeper.service';
import { ReminderSweeperService } from '../src/bookings/reminder-sweeper.service';
import { DEMO_CUSTOMER_VEHICLE } from '../src/database/seeders/demo-vehicle-models.data';
import { demoUser, registerCustomer, signInAs, type Session } from './support/sessions';
import { deleteQuotesAndBookings, tyreOnlyPackage } from './support/packages';
import { startTestApp, type TestApp } from './support/test-app';

interface StartOption {
  startUtc: string;
  endUtc: string;
}
interface BookingEvent {
  at: string;
  kind: string;
  actor: { name: string; role: string } | null;
  detail: string;
}
interface Booking {
  id: string;
  reference: string;
  state: string;
  startUtc: string;
  endUtc: string;
  rego: string | null;
  segments: { minutes: number; startUtc: string; endUtc: string }[];
  quote: {
    id: string;
    reference: string;
    versionId: string;
    versionNumber: number;
    latestVersionNumber: number;
    latestVersionState: string;
    totalCents: number;
    depositCents: number;
  };
  needsMove: { reason: string; since: string } | null;
  payments: { kind: string; status: string; amountCents: number; refundedCents: number }[];
  depositDueCents: number;
  depositPaidCents: number;
  depositTopUpCents: number;
  refundedCents: number;
  balanceDueCents: number;
  events: BookingEvent[];
}
interface Checkout {
  checkoutUrl: string;
  expiresAt: string;
  booking: Booking;
}

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const UUID_PATTERN = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/i;
const ZONE = 'Australia/Sydney';

/**
 * The desk's side of bookings over HTTP against the demo workshop (Australia/Sydney, one tyre
 * bay): the audit trail of every change, who may move and confirm, the deposit top-up after an
 * accepted revision, the re-planning of a booking when a revised quote is accepted, and the
 * day-before reminder. A tyre-only package takes the tyre bay for an hour (4 wheels at the
 * demo's 15 minutes a wheel); each booking here gets time of its own, more than 50 hours ahead.
 */
describe('desk bookings: audit trail, roles, top-ups, re-planning and reminders', () => {
  let testApp: TestApp;
  let customer: Session;
  let other: Session;
  let desk: Session;
  let tech: Session;
  let tyrePackage: object;
  let candidates: StartOption[] = [];
  const used: [number, number][] = [];
  const madeQuotes: string[] = [];
  const customerEmail = demoUser('customer').email;
  const customerName = demoUser('customer').name;
  const deskName = demoUser('desk').name;

  function post(session: Session, path: string, body: object = {}) {
    return session.agent.post(path).set('x-csrf-token', session.csrfToken).send(body);
  }

  async function saveQuote(
    session: Session = customer,
  ): Promise<{ id: string; versionId: string }> {
    const response = await post(session, '/api/quotes', tyrePackage);
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    const quote = response.body as { id: string; versions: { id: string }[] };
    madeQuotes.push(quote.id);
    return { id: quote.id, versionId: quote.versions[0].id };
  }

  /**
   * A start, more than 50 hours ahead, whose next `freeMinutes` nobody else in this spec takes;
   * with `followedBy`, one where another offered start lies exactly that many minutes later.
   */
  function takeStart(freeMinutes = 60, followedBy?: number): StartOption {
    const offered = new Set(candidates.map((option) => Date.parse(option.startUtc)));
    // An hour's job may stay longer in the bay (over the break): its end says how long.
    const span = (option: StartOption): [number, number] => {
      const from = Date.parse(option.startUtc);
      const extra = (freeMinutes - 60) * MINUTE;
      return [from, Math.max(from + freeMinutes * MINUTE, Date.parse(option.endUtc) + extra)];
    };
    const found = candidates.find((option) => {
      const [from, to] = span(option);
      if (from < Date.now() + 50 * HOUR) return false;
      if (followedBy !== undefined && !offered.has(from + followedBy * MINUTE)) return false;
      return used.every(([a, b]) => to <= a || from >= b);
    });
    if (!found) throw new Error('No free start left for the desk bookings spec');
    used.push(span(found));
    return found;
  }

  async function hold(session: Session, versionId: string, start: string): Promise<Booking> {
    const response = await post(session, '/api/bookings', { quoteVersionId: versionId, start });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    return response.body as Booking;
  }

  async function bookingOf(id: string, session: Session = customer): Promise<Booking> {
    const response = await session.agent.get(`/api/bookings/${id}`);
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    return response.body as Booking;
  }

  async function sessionIds(bookingId: string, kind: string): Promise<string[]> {
    const { rows } = await testApp.db.query<{ checkout_session_id: string }>(
      'select checkout_session_id from payment where booking_id = $1 and kind = $2 order by attempt',
      [bookingId, kind],
    );
    return rows.map((row) => row.checkout_session_id);
  }

  /** A held booking of a new quote, its deposit paid through the stand-in: requested. */
  async function requestedBooking(start = takeStart()): Promise<Booking> {
    const quote = await saveQuote();
    const booking = await hold(customer, quote.versionId, start.startUtc);
    await post(customer, `/api/bookings/${booking.id}/deposit-checkout`).expect(201);
    const [sessionId] = await sessionIds(booking.id, 'deposit');
    expect((await testApp.payments.pay(sessionId)).status).toBe(200);
    await expect
      .poll(async () => (await bookingOf(booking.id)).state, { timeout: 10_000, interval: 50 })
      .toBe('requested');
    return bookingOf(booking.id);
  }

  /**
   * The desk's revision of the quote as the lead's revise flow stores it: the latest version
   * superseded, version n+1 sent with the same lines, `extraTyreMinutes` of labour in the tyre
   * bay added to its price lines, and the deposit and total raised by `extraDepositCents`.
   * Returns the new version's number.
   */
  async function revise(
    quoteId: string,
    { extraTyreMinutes = 0, extraDepositCents = 0 } = {},
  ): Promise<number> {
    const latest = (
      await testApp.db.query<{ id: string; number: number }>(
        'select id, number from quote_version where quote_id = $1 order by number desc limit 1',
        [quoteId],
      )
    ).rows[0];
    await testApp.db.query(`update quote_version set state = 'superseded' where id = $1`, [
      latest.id,
    ]);
    const labour = {
      kind: 'labour',
      description: 'Extra tyre bay work',
      amountCents: 0,
      productId: null,
      sku: 'EXTRA',
      labourMinutes: extraTyreMinutes,
      labourRateCentsPerHour: 0,
      bayKind: 'tyre',
    };
    const inserted = await testApp.db.query<{ id: string; number: number }>(
      `insert into quote_version (id, created_at, updated_at, quote_id, number, state,
         state_changed_at, revision_reason, created_by_id, wheels_fitted, tyres_replaced,
         valid_until_date, valid_until, total_cents, deposit_cents, price, fit_report)
       select gen_random_uuid(), now(), now(), quote_id, number + 1, 'sent', now(),
         'Extra work found at inspection', created_by_id, wheels_fitted, tyres_replaced,
         valid_until_date, valid_until, total_cents + $2, deposit_cents + $2,
         case when $3::int > 0
           then jsonb_set(price, '{lines}', (price -> 'lines') || jsonb_build_array($4::jsonb))
           else price end,
         fit_report
         from quote_version where id = $1
       returning id, number`,
      [latest.id, extraDepositCents, extraTyreMinutes, JSON.stringify(labour)],
    );
    const version = inserted.rows[0];
    await testApp.db.query(
      `insert into quote_line (id, created_at, updated_at, version_id, position, product_id, sku,
         name, brand, kind, quantity, unit_price_cents, labour_minutes, bay_kind, lead_days,
         stock_qty, per_wheel)
       select gen_random_uuid(), now(), now(), $2, position, product_id, sku, name, brand, kind,
         quantity, unit_price_cents, labour_minutes, bay_kind, lead_days, stock_qty, per_wheel
         from quote_line where version_id = $1`,
      [latest.id, version.id],
    );
    return version.number;
  }

  async function accept(quoteId: string, number: number): Promise<void> {
    const answer = await post(customer, `/api/quotes/${quoteId}/versions/${number}/accept`);
    expect(answer.status, JSON.stringify(answer.body)).toBe(200);
  }

  function kinds(booking: Booking): string[] {
    return booking.events.map((event) => event.kind);
  }

  function expectPlainDetails(booking: Booking): void {
    for (const event of booking.events) {
      expect(event.detail.length).toBeGreaterThan(0);
      expect(event.detail).not.toMatch(UUID_PATTERN);
      expect(event.detail).not.toMatch(/\b(cs|pi|re|evt)_[A-Za-z0-9]/);
    }
    const times = booking.events.map((event) => Date.parse(event.at));
    expect([...times].sort((a, b) => a - b)).toEqual(times);
  }

  beforeAll(async () => {
    testApp = await startTestApp();
    customer = await signInAs(testApp, 'customer');
    desk = await signInAs(testApp, 'desk');
    tech = await signInAs(testApp, 'tech');
    other = await registerCustomer(testApp);
    tyrePackage = await tyreOnlyPackage(testApp);
    const probe = await saveQuote();
    const found = await customer.agent
      .get(`/api/availability?quoteVersionId=${probe.versionId}&days=28`)
      .expect(200);
    candidates = (found.body as { days: { starts: StartOption[] }[] }).days.flatMap(
      (day) => day.starts,
    );
    expect(candidates.length).toBeGreaterThan(40);
  });

  afterAll(async () => {
    // Leave no mail behind: the next spec's application would have to deliver it.
    await testApp.outboxIdle(25_000);
    await deleteQuotesAndBookings(testApp.db, madeQuotes);
    await testApp.close();
  });

  describe('the audit trail', () => {
    it('records each step of a booking, oldest first, with who did it and plain words', async () => {
      const booking = await requestedBooking();
      const target = takeStart();
      await post(desk, `/api/bookings/${booking.id}/advance`, { state: 'confirmed' }).expect(200);
      const blank = await post(customer, `/api/bookings/${booking.id}/move-request`, {
        note: '   ',
      }).expect(400);
      expect((blank.body as { fieldErrors: Record<string, string[]> }).fieldErrors.note).toEqual([
        'must be 1 to 500 characters',
      ]);
      await post(customer, `/api/bookings/${booking.id}/move-request`, {
        note: 'Could it be a little later?',
      }).expect(200);
      const moved = await post(desk, `/api/bookings/${booking.id}/move`, {
        start: target.startUtc,
      });
      expect(moved.status, JSON.stringify(moved.body)).toBe(200);
      await post(tech, `/api/bookings/${booking.id}/arrived`).expect(403);
      await post(customer, `/api/bookings/${booking.id}/arrived`).expect(403);
      const arrived = await post(desk, `/api/bookings/${booking.id}/arrived`).expect(200);
      expect((arrived.body as { arrivedAt: string | null }).arrivedAt).not.toBeNull();
      const twice = await post(desk, `/api/bookings/${booking.id}/arrived`).expect(409);
      expect((twice.body as { message: string }).message).toContain('already marked in');
      await post(desk, `/api/bookings/${booking.id}/advance`, { state: 'in-progress' }).expect(200);
      await post(desk, `/api/bookings/${booking.id}/advance`, { state: 'completed' }).expect(200);

      const done = await bookingOf(booking.id);
      expect(kinds(done)).toEqual([
        'held',
        'deposit-paid',
        'requested',
        'confirmed',
        'move-requested',
        'moved',
        'arrived',
        'started',
        'completed',
      ]);
      const customerActor = { name: customerName, role: 'customer' };
      const deskActor = { name: deskName, role: 'desk' };
      expect(done.events.map((event) => event.actor)).toEqual([
        customerActor,
        // The payment provider's webhook: no person.
        null,
        null,
        deskActor,
        customerActor,
        deskActor,
        deskActor,
        deskActor,
        deskActor,
      ]);
      expectPlainDetails(done);
      const local = (iso: string) =>
        DateTime.fromISO(iso, { zone: ZONE }).setLocale('en-AU').toFormat('cccc d LLLL yyyy');
      const movedEvent = done.events[5];
      expect(movedEvent.detail).toContain(`Moved from ${local(booking.startUtc)}`);
      expect(movedEvent.detail).toContain(` to ${local(target.startUtc)}`);
      expect(done.events[4].detail).toContain('Could it be a little later?');
      expect(done.events[1].detail).toContain('Deposit of $');
      // The desk sees the same trail.
      expect((await bookingOf(booking.id, desk)).events).toEqual(done.events);
    });

    it('records a cancellation with its refund, and a hold that ran out (the system)', async () => {
      const booking = await requestedBooking();
      const cancelled = await post(customer, `/api/bookings/${booking.id}/cancel`);
      expect(cancelled.status, JSON.stringify(cancelled.body)).toBe(200);
      const after = cancelled.body as Booking;
      const last = after.events.at(-1)!;
      expect(last).toMatchObject({
        kind: 'cancelled',
        actor: { name: customerName, role: 'customer' },
      });
      // More than 48 hours ahead: the whole deposit back under the demo policy.
      const dollars = (booking.quote.depositCents / 100).toLocaleString('en-AU', {
        minimumFractionDigits: 2,
      });
      expect(last.detail).toBe(
        `Cancelled; $${dollars} AUD refunded under the cancellation policy.`,
      );

      const quote = await saveQuote();
      const lapsing = await hold(customer, quote.versionId, takeStart().startUtc);
      await testApp.db.query(
        `update booking set hold_expires_at = now() - interval '1 second' where id = $1`,
        [lapsing.id],
      );
      expect(await testApp.app.get(HoldSweeperService).sweep()).toBeGreaterThanOrEqual(1);
      const expired = await bookingOf(lapsing.id);
      expect(expired.state).toBe('expired');
      expect(kinds(expired)).toEqual(['held', 'expired']);
      expect(expired.events[1].actor).toBeNull();
      expectPlainDetails(expired);
    });
  });

  describe('who may move and confirm', () => {
    it('refuses moving and confirming to the tech and confirming to the customer (403)', async () => {
      const booking = await requestedBooking();
      const start = takeStart();
      await post(tech, `/api/bookings/${booking.id}/move`, { start: start.startUtc }).expect(403);
      await post(tech, `/api/bookings/${booking.id}/advance`, { state: 'confirmed' }).expect(403);
      await post(customer, `/api/bookings/${booking.id}/advance`, {
        state: 'confirmed',
      }).expect(403);
      // The customer's role may call move, but a requested booking is the workshop's to move.
      const asked = await post(customer, `/api/bookings/${booking.id}/move`, {
        start: start.startUtc,
      });
      expect(asked.status).toBe(409);
      expect((asked.body as { message: string }).message).toBe(
        'Ask the workshop to move this booking.',
      );
      const unchanged = await bookingOf(booking.id);
      expect(unchanged).toMatchObject({ state: 'requested', startUtc: booking.startUtc });
      expect(kinds(unchanged)).toEqual(['held', 'deposit-paid', 'requested']);
      // The desk may do both.
      await post(desk, `/api/bookings/${booking.id}/advance`, { state: 'confirmed' }).expect(200);
      const moved = await post(desk, `/api/bookings/${booking.id}/move`, { start: start.startUtc });
      expect(moved.status, JSON.stringify(moved.body)).toBe(200);
      expect((moved.body as Booking).startUtc).toBe(start.startUtc);
    });

    it('lets the customer move their own booking while it is held', async () => {
      const quote = await saveQuote();
      const booking = await hold(customer, quote.versionId, takeStart().startUtc);
      const start = takeStart();
      const moved = await post(customer, `/api/bookings/${booking.id}/move`, {
        start: start.startUtc,
      });
      expect(moved.status, JSON.stringify(moved.body)).toBe(200);
      expect(moved.body).toMatchObject({ state: 'held', startUtc: start.startUtc });
      expect(kinds(moved.body as Booking)).toEqual(['held', 'moved']);
    });

    it("hides another customer's booking and its top-up (404)", async () => {
      const booking = await requestedBooking();
      await other.agent.get(`/api/bookings/${booking.id}`).expect(404);
      await post(other, `/api/bookings/${booking.id}/top-up-checkout`).expect(404);
      await post(other, `/api/bookings/${booking.id}/move`, {
        start: takeStart().startUtc,
      }).expect(404);
      await post(other, `/api/bookings/${booking.id}/cancel`).expect(404);
      await post(tech, `/api/bookings/${booking.id}/top-up-checkout`).expect(403);
      expect((await bookingOf(booking.id)).state).toBe('requested');
    });
  });

  describe('an accepted revision', () => {
    it('with the same bay time relinks the booking; the higher deposit is topped up and receipted', async () => {
      const booking = await requestedBooking();
      expect(booking).toMatchObject({ depositTopUpCents: 0, rego: null });
      // The customer's own vehicle on the quote gives the booking its rego.
      await testApp.db.query(
        `update quote set customer_vehicle_id =
           (select id from customer_vehicle where rego = $2) where id = $1`,
        [booking.quote.id, DEMO_CUSTOMER_VEHICLE.rego],
      );
      expect((await bookingOf(booking.id, desk)).rego).toBe(DEMO_CUSTOMER_VEHICLE.rego);
      const topUp = 25_000;
      const number = await revise(booking.quote.id, { extraDepositCents: topUp });
      await accept(booking.quote.id, number);

      const relinked = await bookingOf(booking.id);
      expect(relinked).toMatchObject({
        state: 'requested',
        startUtc: booking.startUtc,
        endUtc: booking.endUtc,
        needsMove: null,
        quote: {
          versionNumber: number,
          latestVersionNumber: number,
          latestVersionState: 'accepted',
          depositCents: booking.quote.depositCents + topUp,
        },
        depositDueCents: booking.quote.depositCents + topUp,
        depositPaidCents: booking.quote.depositCents,
        depositTopUpCents: topUp,
      });
      expect(relinked.events.at(-1)).toMatchObject({
        kind: 're-planned',
        actor: { name: customerName, role: 'customer' },
      });
      expect(relinked.events.at(-1)!.detail).toContain(`${booking.quote.reference} v${number}`);
      expect(relinked.events.at(-1)!.detail).toContain('same bay time');

      // The checkout of the difference: the same flow and key pattern as the deposit.
      const first = await post(customer, `/api/bookings/${booking.id}/top-up-checkout`);
      expect(first.status, JSON.stringify(first.body)).toBe(201);
      const started = first.body as Checkout;
      const again = (await post(desk, `/api/bookings/${booking.id}/top-up-checkout`).expect(201))
        .body as Checkout;
      expect(again.checkoutUrl).toBe(started.checkoutUrl);
      const [sessionId, ...more] = await sessionIds(booking.id, 'top-up');
      expect(more).toEqual([]);
      expect(started.checkoutUrl).toBe(`${testApp.payments.fake.url}/pay/${sessionId}`);
      const session = await testApp.payments.sdk.checkout.sessions.retrieve(sessionId, {
        expand: ['line_items'],
      });
      expect(session).toMatchObject({
        mode: 'payment',
        amount_total: topUp,
        currency: 'aud',
        customer_email: customerEmail,
        metadata: { bookingId: booking.id, bookingReference: booking.reference },
        success_url: `http://127.0.0.1:4400/account/bookings/${booking.id}/paid?session_id={CHECKOUT_SESSION_ID}`,
      });
      expect(session.line_items?.data.map((item) => item.description)).toEqual([
        `Deposit top-up for booking ${booking.reference} (quote ${booking.quote.reference} v${number})`,
      ]);
      expect(started.booking.payments.at(-1)).toMatchObject({
        kind: 'top-up',
        status: 'open',
        amountCents: topUp,
      });

      const mailsBefore = testApp.mailbox.messages.length;
      const attemptsBefore = testApp.payments.relay.attempts.length;
      expect((await testApp.payments.pay(sessionId)).status).toBe(200);
      await expect
        .poll(async () => (await bookingOf(booking.id)).depositTopUpCents, { timeout: 10_000 })
        .toBe(0);
      await testApp.payments.fake.webhooks.idle();
      const paid = await bookingOf(booking.id);
      const depositCents = booking.quote.depositCents + topUp;
      expect(paid).toMatchObject({
        // A top-up changes no state.
        state: 'requested',
        depositPaidCents: depositCents,
        depositTopUpCents: 0,
        balanceDueCents: booking.quote.totalCents + topUp - depositCents,
      });
      expect(paid.payments.map((row) => [row.kind, row.status])).toEqual([
        ['deposit', 'paid'],
        ['top-up', 'paid'],
      ]);
      expect(kinds(paid).filter((kind) => kind === 'top-up-paid')).toHaveLength(1);
      expect(paid.events.at(-1)).toMatchObject({ kind: 'top-up-paid', actor: null });
      expectPlainDetails(paid);

      // The provider's events verify with the official SDK; delivered again, signed afresh by
      // its test helper, they are recognised and change nothing.
      const sent = testApp.payments.relay.attempts.slice(attemptsBefore);
      expect(sent.length).toBeGreaterThan(0);
      for (const attempt of sent) {
        // Source: the provider's webhook signature scheme (Stripe-Signature t=…,v1=…,
        // HMAC-SHA256 of "t.payload"), as implemented by its official SDK.
        const event: Stripe.Event = testApp.payments.sdk.webhooks.constructEvent(
          attempt.body,
          attempt.signature,
          testApp.payments.webhookSecret,
        );
        expect(event.id).toBe(attempt.eventId);
        const resigned = testApp.payments.sdk.webhooks.generateTestHeaderString({
          payload: attempt.body,
          secret: testApp.payments.webhookSecret,
        });
        const repeat = await request(testApp.server)
          .post('/api/payments/webhook')
          .set('Content-Type', 'application/json')
          .set('Stripe-Signature', resigned)
          .send(attempt.body);
        expect(repeat.status).toBe(200);
        expect(repeat.body).toEqual({ received: true, duplicate: true });
      }
      expect(kinds(await bookingOf(booking.id)).filter((k) => k === 'top-up-paid')).toHaveLength(1);

      const mail = await testApp.mailbox.waitFor(customerEmail, mailsBefore, 5000, (message) =>
        message.subject.includes('top-up'),
      );
      expect(mail.subject).toBe(`Receipt: deposit top-up for booking ${booking.reference}`);
      for (const part of [mail.text, mail.html]) {
        expect(part).toContain('$250.00 AUD');
        expect(part).toContain(booking.reference);
        expect(part).not.toMatch(UUID_PATTERN);
      }

      const nothing = await post(customer, `/api/bookings/${booking.id}/top-up-checkout`);
      expect(nothing.status).toBe(409);
      expect((nothing.body as { message: string }).message).toBe(
        `Nothing is due: the deposit for booking ${booking.reference} is paid in full.`,
      );
    });

    it('refunds in full a top-up that is paid after the booking was cancelled', async () => {
      const booking = await requestedBooking();
      await accept(booking.quote.id, await revise(booking.quote.id, { extraDepositCents: 10_000 }));
      await post(customer, `/api/bookings/${booking.id}/top-up-checkout`).expect(201);
      const [sessionId] = await sessionIds(booking.id, 'top-up');
      testApp.payments.relay.refuseNext(1_000_000);
      try {
        expect((await testApp.payments.pay(sessionId)).status).toBe(200);
        const cancelled = await post(desk, `/api/bookings/${booking.id}/cancel`);
        expect(cancelled.status, JSON.stringify(cancelled.body)).toBe(200);
      } finally {
        testApp.payments.relay.refuseNext(0);
      }
      await expect
        .poll(
          async () =>
            (await bookingOf(booking.id)).payments.find((row) => row.kind === 'top-up')
              ?.refundedCents,
          { timeout: 10_000 },
        )
        .toBe(10_000);
      const after = await bookingOf(booking.id);
      expect(after).toMatchObject({ state: 'cancelled', depositTopUpCents: 0, balanceDueCents: 0 });
      const event = after.events.at(-1)!;
      expect(event.kind).toBe('top-up-paid');
      expect(event.detail).toContain('$100.00 AUD refunded');
      // Not while cancelled.
      await post(customer, `/api/bookings/${booking.id}/top-up-checkout`).expect(409);
    });

    it('that is longer and fits at the same start replaces the reservations and tells the customer', async () => {
      // An hour of its own, with the hour after it free and offered.
      const start = takeStart(120, 60);
      const booking = await requestedBooking(start);
      await post(desk, `/api/bookings/${booking.id}/advance`, { state: 'confirmed' }).expect(200);
      const before = await testApp.db.query<{ calendar_sequence: number }>(
        'select calendar_sequence from booking where id = $1',
        [booking.id],
      );
      const mailsBefore = testApp.mailbox.messages.length;
      const number = await revise(booking.quote.id, { extraTyreMinutes: 30 });
      await accept(booking.quote.id, number);

      const replanned = await bookingOf(booking.id);
      expect(replanned).toMatchObject({
        state: 'confirmed',
        startUtc: booking.startUtc,
        needsMove: null,
        quote: { versionNumber: number },
      });
      // 60 minutes of fitting and 30 of the added labour, in the one tyre bay.
      expect(replanned.segments.map((segment) => segment.minutes)).toEqual([90]);
      expect(Date.parse(replanned.endUtc)).toBeGreaterThanOrEqual(
        Date.parse(booking.startUtc) + 90 * MINUTE,
      );
      const rows = await testApp.db.query<{
        starts_at: Date;
        ends_at: Date;
        active: boolean;
        calendar_sequence: number;
      }>(
        `select r.starts_at, r.ends_at, r.active, b.calendar_sequence
           from reservation r join booking b on b.id = r.booking_id where b.id = $1`,
        [booking.id],
      );
      expect(rows.rows).toHaveLength(1);
      expect(rows.rows[0]).toMatchObject({ active: true });
      expect(rows.rows[0].ends_at.toISOString()).toBe(replanned.endUtc);
      expect(rows.rows[0].calendar_sequence).toBe(before.rows[0].calendar_sequence + 1);
      expect(replanned.events.at(-1)).toMatchObject({ kind: 're-planned' });
      expect(replanned.events.at(-1)!.detail).toContain('tyre bay 1 h → tyre bay 1 h 30 min');
      expectPlainDetails(replanned);
      const mail = await testApp.mailbox.waitFor(customerEmail, mailsBefore, 5000, (message) =>
        message.subject.startsWith(`Booking ${booking.reference} moved`),
      );
      expect(mail.text).toContain(booking.reference);
    });

    it('that is longer and does not fit keeps the time and asks the desk to move it', async () => {
      // The hour after the booking is another customer's.
      const start = takeStart(120, 60);
      const booking = await requestedBooking(start);
      const theirs = await saveQuote(other);
      const blockerStart = new Date(Date.parse(start.startUtc) + HOUR).toISOString();
      await hold(other, theirs.versionId, blockerStart);
      const reservations = async () =>
        (
          await testApp.db.query(
            'select id, bay_id, starts_at, ends_at, active from reservation where booking_id = $1',
            [booking.id],
          )
        ).rows;
      const kept = await reservations();
      const number = await revise(booking.quote.id, { extraTyreMinutes: 30 });
      await accept(booking.quote.id, number);

      const flagged = await bookingOf(booking.id);
      expect(flagged).toMatchObject({
        state: 'requested',
        startUtc: booking.startUtc,
        endUtc: booking.endUtc,
        quote: { versionNumber: number },
        needsMove: {
          reason: expect.stringContaining('tyre bay 1 h 30 min'),
          since: expect.any(String),
        },
      });
      expect(await reservations()).toEqual(kept);
      expect(kinds(flagged).slice(-2)).toEqual(['re-planned', 'needs-move']);
      expect(flagged.events.at(-1)!.actor).toBeNull();
      expectPlainDetails(flagged);
      // The desk sees the flag; a move to a time that fits the longer job clears it.
      expect((await bookingOf(booking.id, desk)).needsMove).not.toBeNull();
      const found = await desk.agent
        .get(`/api/availability?quoteVersionId=${flagged.quote.versionId}&days=28`)
        .expect(200);
      const free = (found.body as { days: { starts: StartOption[] }[] }).days
        .flatMap((day) => day.starts)
        .find((option) => {
          const from = Date.parse(option.startUtc);
          const to = Date.parse(option.endUtc);
          return from > Date.now() + 50 * HOUR && used.every(([a, b]) => to <= a || from >= b);
        })!;
      used.push([Date.parse(free.startUtc), Date.parse(free.endUtc)]);
      const moved = await post(desk, `/api/bookings/${booking.id}/move`, { start: free.startUtc });
      expect(moved.status, JSON.stringify(moved.body)).toBe(200);
      const cleared = moved.body as Booking;
      expect(cleared).toMatchObject({ needsMove: null, startUtc: free.startUtc });
      expect(cleared.segments.map((segment) => segment.minutes)).toEqual([90]);
      expect(cleared.events.at(-1)).toMatchObject({
        kind: 'moved',
        actor: { name: deskName, role: 'desk' },
      });
    });
  });

  describe('the day-before reminder', () => {
    it('queues one reminder per booking and start for the next local day, across a DST change', async () => {
      // Source: IANA tz database (the zone data the runtime ships): Australia/Sydney moves from
      // AEST (UTC+10) to AEDT (UTC+11) at 02:00 local on Sunday 4 October 2026.
      expect(DateTime.fromISO('2026-10-04T01:30', { zone: ZONE }).offset).toBe(600);
      expect(DateTime.fromISO('2026-10-04T03:30', { zone: ZONE }).offset).toBe(660);
      const at = (local: string) => DateTime.fromISO(local, { zone: ZONE }).toJSDate();

      // Four bookings of the customer, placed by date around the change.
      const made: Booking[] = [];
      for (let index = 0; index < 4; index += 1) {
        const quote = await saveQuote();
        made.push(await hold(customer, quote.versionId, takeStart().startUtc));
      }
      const [early, morning, nextDay, unconfirmed] = made;
      const place = async (booking: Booking, local: string, state = 'confirmed') => {
        const startsAt = at(local);
        await testApp.db.query(
          `update booking set state = $2, hold_expires_at = null, starts_at = $3, ends_at = $4
            where id = $1`,
          [booking.id, state, startsAt, new Date(startsAt.getTime() + HOUR)],
        );
      };
      // Monday 5 October 00:15 AEDT and 07:30 AEDT: the day after the short Sunday.
      await place(early, '2026-10-05T00:15');
      await place(morning, '2026-10-05T07:30');
      // Tuesday 6 October 00:30 AEDT: not tomorrow (a fixed UTC+10 day would take it).
      await place(nextDay, '2026-10-06T00:30');
      await place(unconfirmed, '2026-10-05T09:00', 'requested');

      const sweeper = testApp.app.get(ReminderSweeperService);
      const mailsBefore = testApp.mailbox.messages.length;
      // Saturday evening: tomorrow is the Sunday, nothing is due.
      expect(await sweeper.sweep(at('2026-10-03T20:00'))).toBe(0);
      // Sunday 01:30 AEST, before the clocks go forward: tomorrow is Monday.
      const sunday = at('2026-10-04T01:30');
      expect(sunday.toISOString()).toBe('2026-10-03T15:30:00.000Z');
      expect(await sweeper.sweep(sunday)).toBe(2);
      // Again, and later the same Sunday (after the change): nothing new.
      expect(await sweeper.sweep(sunday)).toBe(0);
      expect(await sweeper.sweep(at('2026-10-04T23:30'))).toBe(0);

      await testApp.outboxIdle();
      const reminders = () =>
        testApp.mailbox.messages
          .slice(mailsBefore)
          .filter((message) => message.subject.startsWith('Reminder:'));
      expect(
        reminders()
          .map((message) => message.subject)
          .sort(),
      ).toEqual(
        [
          `Reminder: booking ${early.reference} tomorrow at 12:15 am`,
          `Reminder: booking ${morning.reference} tomorrow at 7:30 am`,
        ].sort(),
      );
      const mail = reminders().find((message) => message.subject.includes(morning.reference))!;
      for (const part of [mail.text, mail.html]) {
        expect(part).toContain('Monday 5 October 2026, 7:30 am AEDT');
        expect(part).toContain('0491 570 006');
        expect(part).toContain('licensed technician');
        expect(part).not.toMatch(UUID_PATTERN);
      }

      // Moved to later the same Monday: a new start, so a new reminder.
      await place(morning, '2026-10-05T10:00');
      expect(await sweeper.sweep(sunday)).toBe(1);
      expect(await sweeper.sweep(sunday)).toBe(0);
      await testApp.outboxIdle();
      expect(reminders()).toHaveLength(3);
      expect(reminders().at(-1)!.subject).toBe(
        `Reminder: booking ${morning.reference} tomorrow at 10:00 am`,
      );
    });
  });
});
