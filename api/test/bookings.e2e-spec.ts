import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HoldSweeperService } from '../src/bookings/hold-sweeper.service';
import { registerCustomer, signInAs, type Session } from './support/sessions';
import { tyreOnlyPackage } from './support/packages';
import { startTestApp, type TestApp } from './support/test-app';

interface Segment {
  bayId: string;
  bayName: string;
  bayKind: string;
  minutes: number;
  startUtc: string;
  endUtc: string;
  start: string;
}
interface StartOption {
  start: string;
  startUtc: string;
  localTime: string;
  endUtc: string;
  segments: Segment[];
}
interface Availability {
  timeZone: string;
  holdMinutes: number;
  plan: { segments: { bayKind: string; minutes: number }[]; earliestStartDate: string };
  days: { date: string; closedReason: string | null; starts: StartOption[] }[];
}
interface Booking {
  id: string;
  reference: string;
  state: string;
  holdExpiresAt: string | null;
  startUtc: string;
  endUtc: string;
  segments: Segment[];
  quote: { id: string; versionId: string; reference: string };
  customer: { id: string };
}

/**
 * Bays, availability and holds over HTTP against the migrated demo workshop (Australia/Sydney;
 * 3 hoists, the alignment bay, a tyre bay; Monday–Friday 7:30–17:00 with a break, Saturday
 * morning). A tyre-only package needs the one tyre bay, so one start holds one booking.
 */
describe('bookings: availability, holds, moves and the database guard', () => {
  let testApp: TestApp;
  let customer: Session;
  let other: Session & { id: string };
  let desk: Session;
  let tech: Session;
  let tyrePackage: object;
  const madeQuotes: string[] = [];

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

  async function availability(
    versionId: string,
    session: Session = customer,
    extra = '',
  ): Promise<Availability> {
    const response = await session.agent.get(
      `/api/availability?quoteVersionId=${versionId}&days=14${extra}`,
    );
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    return response.body as Availability;
  }

  function allStarts(found: Availability): StartOption[] {
    return found.days.flatMap((day) => day.starts);
  }

  async function activeOverlaps(): Promise<number> {
    const result = await testApp.db.query<{ count: string }>(
      `select count(*) from reservation a join reservation b
         on a.bay_id = b.bay_id and a.id < b.id
        where a.active and b.active and a.during && b.during`,
    );
    return Number(result.rows[0].count);
  }

  beforeAll(async () => {
    testApp = await startTestApp();
    customer = await signInAs(testApp, 'customer');
    desk = await signInAs(testApp, 'desk');
    tech = await signInAs(testApp, 'tech');
    other = await registerCustomer(testApp);
    tyrePackage = await tyreOnlyPackage(testApp);
  });

  afterAll(async () => {
    // Leave no mail behind: the next spec's application would have to deliver it.
    await testApp.outboxIdle(25_000);
    await testApp.db.query(
      `delete from booking where quote_version_id in
         (select id from quote_version where quote_id = any($1::uuid[]))`,
      [madeQuotes],
    );
    await testApp.db.query('delete from quote where id = any($1::uuid[])', [madeQuotes]);
    await testApp.close();
  });

  it('offers starts in the workshop zone with what each covers, and holds one', async () => {
    const quote = await saveQuote();
    const found = await availability(quote.versionId);
    expect(found.timeZone).toBe('Australia/Sydney');
    expect(found.plan.segments).toEqual([
      // Fitting and balancing of 4 wheels at the demo's 15 minutes a wheel.
      expect.objectContaining({ bayKind: 'tyre', minutes: 60 }),
    ]);
    expect(found.days).toHaveLength(14);
    // Sundays are closed in the demo workshop.
    const sunday = found.days.find((day) => new Date(`${day.date}T12:00:00Z`).getUTCDay() === 0);
    expect(sunday?.starts).toEqual([]);
    expect(sunday?.closedReason).toMatch(/Sunday/);
    const first = allStarts(found)[0];
    expect(first.segments).toEqual([expect.objectContaining({ bayName: 'Tyre bay', minutes: 60 })]);
    expect(Date.parse(first.endUtc) - Date.parse(first.startUtc)).toBe(60 * 60_000);
    // The local time and the UTC instant are the same moment.
    expect(Date.parse(first.start)).toBe(Date.parse(first.startUtc));

    const before = Date.now();
    const held = await post(customer, '/api/bookings', {
      quoteVersionId: quote.versionId,
      start: first.startUtc,
    });
    expect(held.status, JSON.stringify(held.body)).toBe(201);
    const booking = held.body as Booking;
    expect(booking).toMatchObject({ state: 'held', startUtc: first.startUtc });
    expect(booking.reference).toMatch(/^B-\d{6}$/);
    const expiresInMs = Date.parse(booking.holdExpiresAt!) - before;
    expect(expiresInMs).toBeGreaterThan((found.holdMinutes * 60 - 5) * 1000);
    expect(expiresInMs).toBeLessThanOrEqual((found.holdMinutes * 60 + 5) * 1000);

    // Another customer's quote and booking are not there for them.
    await other.agent.get(`/api/bookings/${booking.id}`).expect(404);
    await other.agent.get(`/api/availability?quoteVersionId=${quote.versionId}`).expect(404);
    const list = await other.agent.get('/api/bookings').expect(200);
    expect((list.body as { items: Booking[] }).items).toEqual([]);
    await desk.agent.get(`/api/bookings/${booking.id}`).expect(200);
    await tech.agent.get(`/api/bookings/${booking.id}`).expect(403);
    await post(customer, `/api/bookings/${booking.id}/cancel`).expect(200);
  });

  it('refuses a malformed start or day with field errors and changes nothing', async () => {
    const quote = await saveQuote();
    const before = await testApp.db.query('select count(*) from booking');
    const bad = await post(customer, '/api/bookings', {
      quoteVersionId: quote.versionId,
      start: '2026-12-03T07:30',
    });
    expect(bad.status).toBe(400);
    expect(Object.keys((bad.body as { fieldErrors: object }).fieldErrors)).toEqual(['start']);
    const badDay = await customer.agent.get(
      `/api/availability?quoteVersionId=${quote.versionId}&from=2026-02-30`,
    );
    expect(badDay.status).toBe(400);
    expect((badDay.body as { fieldErrors: object }).fieldErrors).toHaveProperty('from');
    const after = await testApp.db.query('select count(*) from booking');
    expect(after.rows[0]).toEqual(before.rows[0]);
  });

  it('does not hold an expired quote', async () => {
    const quote = await saveQuote();
    const start = allStarts(await availability(quote.versionId))[0];
    await testApp.db.query(
      `update quote_version set valid_until = now() - interval '1 day',
         valid_until_date = to_char(now() - interval '2 days', 'YYYY-MM-DD') where id = $1`,
      [quote.versionId],
    );
    const refused = await post(customer, '/api/bookings', {
      quoteVersionId: quote.versionId,
      start: start.startUtc,
    });
    expect(refused.status).toBe(409);
    expect((refused.body as { message: string }).message).toMatch(/expired/);
    await customer.agent.get(`/api/availability?quoteVersionId=${quote.versionId}`).expect(409);
    const rows = await testApp.db.query('select 1 from booking where quote_version_id = $1', [
      quote.versionId,
    ]);
    expect(rows.rowCount).toBe(0);
  });

  it('frees the time of a hold that ran out, and the sweep marks it expired', async () => {
    const first = await saveQuote();
    const second = await saveQuote();
    const start = allStarts(await availability(first.versionId))[2];
    const held = (
      await post(customer, '/api/bookings', {
        quoteVersionId: first.versionId,
        start: start.startUtc,
      }).expect(201)
    ).body as Booking;
    const taken = allStarts(await availability(second.versionId)).map((s) => s.startUtc);
    expect(taken).not.toContain(start.startUtc);

    await testApp.db.query(
      `update booking set hold_expires_at = now() - interval '1 second' where id = $1`,
      [held.id],
    );
    // Availability ignores the lapsed hold before any sweep has run…
    const again = allStarts(await availability(second.versionId)).map((s) => s.startUtc);
    expect(again).toContain(start.startUtc);
    // …and the sweep marks it expired and releases its bay.
    const expired = await testApp.app.get(HoldSweeperService).sweep();
    expect(expired).toBeGreaterThanOrEqual(1);
    const row = await testApp.db.query<{ state: string; active: boolean }>(
      `select b.state, r.active from booking b join reservation r on r.booking_id = b.id where b.id = $1`,
      [held.id],
    );
    expect(row.rows).toEqual([{ state: 'expired', active: false }]);
    const retaken = await post(customer, '/api/bookings', {
      quoteVersionId: second.versionId,
      start: start.startUtc,
    });
    expect(retaken.status, JSON.stringify(retaken.body)).toBe(201);
    await post(customer, `/api/bookings/${(retaken.body as Booking).id}/cancel`).expect(200);
  });

  it('moving onto a taken time leaves the original reservation untouched', async () => {
    const mine = await saveQuote();
    const theirs = await saveQuote(other);
    const starts = allStarts(await availability(mine.versionId));
    const [a, b] = [starts[4], starts[8]];
    const booking = (
      await post(customer, '/api/bookings', {
        quoteVersionId: mine.versionId,
        start: a.startUtc,
      }).expect(201)
    ).body as Booking;
    const blocker = (
      await post(other, '/api/bookings', {
        quoteVersionId: theirs.versionId,
        start: b.startUtc,
      }).expect(201)
    ).body as Booking;
    const reservationsBefore = await testApp.db.query(
      'select id, bay_id, starts_at, ends_at, active from reservation where booking_id = $1',
      [booking.id],
    );

    const refused = await post(customer, `/api/bookings/${booking.id}/move`, { start: b.startUtc });
    expect(refused.status).toBe(409);
    const conflict = refused.body as { message: string; nextStarts: StartOption[] };
    expect(conflict.nextStarts.length).toBeGreaterThan(0);
    expect(conflict.nextStarts.every((s) => Date.parse(s.startUtc) > Date.parse(b.startUtc))).toBe(
      true,
    );
    const reservationsAfter = await testApp.db.query(
      'select id, bay_id, starts_at, ends_at, active from reservation where booking_id = $1',
      [booking.id],
    );
    expect(reservationsAfter.rows).toEqual(reservationsBefore.rows);
    const unchanged = (await customer.agent.get(`/api/bookings/${booking.id}`).expect(200))
      .body as Booking;
    expect(unchanged).toMatchObject({ state: 'held', startUtc: a.startUtc });

    // A free time moves it whole.
    const moved = await post(customer, `/api/bookings/${booking.id}/move`, {
      start: conflict.nextStarts[0].startUtc,
    });
    expect(moved.status, JSON.stringify(moved.body)).toBe(200);
    expect((moved.body as Booking).startUtc).toBe(conflict.nextStarts[0].startUtc);
    const rows = await testApp.db.query('select count(*) from reservation where booking_id = $1', [
      booking.id,
    ]);
    expect(rows.rows[0].count).toBe('1');
    await post(customer, `/api/bookings/${booking.id}/cancel`).expect(200);
    await post(other, `/api/bookings/${blocker.id}/cancel`).expect(200);
    expect(await activeOverlaps()).toBe(0);
  });

  it('the desk confirms a requested booking and moves it along its work; others may not', async () => {
    const quote = await saveQuote();
    const start = allStarts(await availability(quote.versionId))[12];
    const booking = (
      await post(customer, '/api/bookings', {
        quoteVersionId: quote.versionId,
        start: start.startUtc,
      }).expect(201)
    ).body as Booking;
    // A held booking is not a request yet: the deposit makes it one.
    const early = await post(desk, `/api/bookings/${booking.id}/advance`, { state: 'confirmed' });
    expect(early.status).toBe(409);
    await testApp.db.query(
      `update booking set state = 'requested', hold_expires_at = null where id = $1`,
      [booking.id],
    );
    await post(customer, `/api/bookings/${booking.id}/advance`, { state: 'confirmed' }).expect(403);
    await post(tech, `/api/bookings/${booking.id}/advance`, { state: 'confirmed' }).expect(403);
    const bad = await post(desk, `/api/bookings/${booking.id}/advance`, { state: 'held' });
    expect(bad.status).toBe(400);
    expect((bad.body as { fieldErrors: object }).fieldErrors).toHaveProperty('state');
    for (const state of ['confirmed', 'in-progress', 'completed']) {
      const answer = await post(desk, `/api/bookings/${booking.id}/advance`, { state });
      expect(answer.status, JSON.stringify(answer.body)).toBe(200);
      expect((answer.body as Booking).state).toBe(state);
    }
    // A completed job keeps its history; its bays stay as they were recorded.
    const skipped = await post(desk, `/api/bookings/${booking.id}/advance`, { state: 'confirmed' });
    expect(skipped.status).toBe(409);
  });

  it('the database refuses an overlapping reservation even past the application (exclusion constraint)', async () => {
    const quote = await saveQuote();
    const start = allStarts(await availability(quote.versionId))[6];
    const booking = (
      await post(customer, '/api/bookings', {
        quoteVersionId: quote.versionId,
        start: start.startUtc,
      }).expect(201)
    ).body as Booking;
    const segment = booking.segments[0];
    await expect(
      testApp.db.query(
        `insert into reservation (id, created_at, updated_at, booking_id, bay_id, starts_at, ends_at, active)
         values (gen_random_uuid(), now(), now(), $1, $2, $3::timestamptz + interval '30 minutes',
                 $4::timestamptz + interval '30 minutes', true)`,
        [booking.id, segment.bayId, segment.startUtc, segment.endUtc],
      ),
    ).rejects.toMatchObject({ code: '23P01' });
    // Touching ends do not overlap: the range is half-open.
    await testApp.db.query(
      `insert into reservation (id, created_at, updated_at, booking_id, bay_id, starts_at, ends_at, active)
       values (gen_random_uuid(), now(), now(), $1, $2, $3, $3::timestamptz + interval '1 hour', false)`,
      [booking.id, segment.bayId, segment.endUtc],
    );
    await post(customer, `/api/bookings/${booking.id}/cancel`).expect(200);
  });

  it('50 concurrent holds of one start: exactly one held, 49 refused with 409', async () => {
    const quotes = [];
    for (let i = 0; i < 50; i += 1) quotes.push(await saveQuote());
    const start = allStarts(await availability(quotes[0].versionId))[10];
    const answers = await Promise.all(
      quotes.map((quote) =>
        post(customer, '/api/bookings', { quoteVersionId: quote.versionId, start: start.startUtc }),
      ),
    );
    const statuses = answers.map((answer) => answer.status);
    expect(statuses.filter((status) => status === 201)).toHaveLength(1);
    expect(statuses.filter((status) => status === 409)).toHaveLength(49);
    expect(await activeOverlaps()).toBe(0);
    const held = answers.find((answer) => answer.status === 201)!.body as Booking;
    await post(customer, `/api/bookings/${held.id}/cancel`).expect(200);
  }, 120_000);

  it('200 concurrent holds over 20 starts: exactly 20 held', async () => {
    const quotes = [];
    for (let i = 0; i < 200; i += 1) quotes.push(await saveQuote());
    // 20 starts whose times do not overlap one another (each job takes the tyre bay for an hour).
    const candidates = allStarts(await availability(quotes[0].versionId));
    const starts: StartOption[] = [];
    for (const option of candidates) {
      const last = starts.at(-1);
      if (!last || Date.parse(option.startUtc) >= Date.parse(last.endUtc)) starts.push(option);
      if (starts.length === 20) break;
    }
    expect(starts).toHaveLength(20);
    const answers = await Promise.all(
      quotes.map((quote, index) =>
        post(customer, '/api/bookings', {
          quoteVersionId: quote.versionId,
          start: starts[index % 20].startUtc,
        }),
      ),
    );
    const held = answers.filter((answer) => answer.status === 201);
    expect(held).toHaveLength(20);
    expect(answers.filter((answer) => answer.status === 409)).toHaveLength(180);
    expect(new Set(held.map((answer) => (answer.body as Booking).startUtc)).size).toBe(20);
    expect(await activeOverlaps()).toBe(0);
    for (const answer of held) {
      await post(customer, `/api/bookings/${(answer.body as Booking).id}/cancel`).expect(200);
    }
  }, 120_000);
});
