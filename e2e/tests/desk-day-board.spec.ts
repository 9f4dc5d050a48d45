import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  holdFirstFreeTime,
  newCustomerWithSavedQuote,
  payDepositThroughStandIn,
} from '../support/booking-setup';
import { newPage } from '../support/browser';
import { journey } from '../support/journey';
import { demoUsers } from '../support/env';
import { getJson, signIn } from '../support/session';

const JOURNEY = 'desk-day-board';

interface StartOption {
  startUtc: string;
  localTime: string;
  segments: { bayName: string }[];
}

interface Booking {
  id: string;
  reference: string;
  state: string;
  startUtc: string;
  timeZone: string;
  customer: { name: string; email: string };
  arrivedAt: string | null;
  quote: { id: string; reference: string; versionId: string; vehicleName: string };
  segments: { bayName: string }[];
}

interface Availability {
  days: { date: string; starts: StartOption[] }[];
}

const { browser: currentBrowser, record } = journey(JOURNEY);

async function readBooking(page: Page, bookingId: string): Promise<Booking> {
  const answer = await getJson<Booking>(page, `/api/bookings/${bookingId}`);
  expect(answer.status).toBe(200);
  return answer.body;
}

/** A workshop-local date "YYYY-MM-DD" of an instant, by this Node process's time zone data. */
function localDate(isoInstant: string, timeZone: string): string {
  return new Intl.DateTimeFormat('en-CA', { timeZone, dateStyle: 'short' }).format(
    new Date(isoInstant),
  );
}

/** "Thursday 3 December", how the picker's calendar names a day (by this Node's Intl). */
function longDate(isoDate: string): string {
  return new Intl.DateTimeFormat('en-AU', {
    weekday: 'long',
    day: 'numeric',
    month: 'long',
    timeZone: 'UTC',
  }).format(new Date(`${isoDate}T00:00:00Z`));
}

/** "Thu 3 Dec", how the week view names a day (by this Node's Intl). */
function shortDate(isoDate: string): string {
  return new Intl.DateTimeFormat('en-AU', {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    timeZone: 'UTC',
  })
    .format(new Date(`${isoDate}T00:00:00Z`))
    .replace(',', '');
}

/** "07:30" → a pattern for the button "7:30 am" (the space before am may be a narrow one). */
function clockPattern(localTime: string): RegExp {
  const [hours, minutes] = localTime.split(':').map(Number);
  const twelve = hours % 12 === 0 ? 12 : hours % 12;
  const half = hours < 12 ? 'am' : 'pm';
  return new RegExp(`^${twelve}:${String(minutes).padStart(2, '0')}\\s?${half}`, 'i');
}

/**
 * Set-up as a customer does it, quickly: a new customer, a saved quote, a time held, and the
 * deposit paid through the stand-in's JSON test hook; the provider's webhook makes it requested.
 */
async function newRequestedBooking(page: Page): Promise<Booking> {
  const { quote } = await newCustomerWithSavedQuote(page, 'board', 'Tamsin Voller');
  const bookingId = await holdFirstFreeTime(page, quote.id);
  await payDepositThroughStandIn(page, bookingId);
  return readBooking(page, bookingId);
}

describe('the front desk confirms a request and moves it on the day board', () => {
  it('finds the customer’s request to move, confirms, moves it to another day, and both sides see the move (desktop)', async () => {
    const customerSide = await newPage(currentBrowser(), 'desktop');
    const { context, page } = await newPage(currentBrowser(), 'desktop');
    try {
      const requested = await newRequestedBooking(customerSide.page);
      const { reference, timeZone } = requested;

      // 0. The customer asks to move it, from their booking page.
      const asked = 'Could it be another day, first thing?';
      await customerSide.page.goto(`/account/bookings/${requested.id}`);
      await customerSide.page.getByRole('button', { name: 'Ask to move' }).click();
      const askDialog = customerSide.page.getByRole('dialog', {
        name: `Ask to move booking ${reference}`,
      });
      await askDialog.getByLabel('When would suit you better?').fill(asked);
      await askDialog.getByRole('button', { name: 'Send the request' }).click();
      await expect
        .poll(() =>
          customerSide.page.getByText('Waiting for the workshop', { exact: false }).isVisible(),
        )
        .toBe(true);

      // 1. Requests: waiting for confirmation, searched by the customer's e-mail.
      await signIn(page, demoUsers.desk);
      await page.goto('/desk/bookings');
      await page
        .getByRole('button', { name: /^Waiting for confirmation/ })
        .first()
        .click();
      await page.getByLabel('Search bookings').fill(requested.customer.email);
      const grid = page.getByRole('grid', { name: 'Bookings' });
      const link = grid.getByRole('link', { name: reference, exact: true });
      await expect.poll(() => link.isVisible()).toBe(true);
      // Only requested bookings are listed in this view.
      const rowText = (await grid.getByRole('row').nth(1).textContent()) ?? '';
      expect(rowText).toContain('Requested');
      expect(rowText).toContain(requested.quote.reference);
      expect(rowText).toContain(requested.customer.name);
      await record(page, 'requests');
      // The same booking is among those the customer asked to move, flagged in its row.
      await page.getByRole('button', { name: /^Move requested/ }).click();
      await expect.poll(() => link.isVisible()).toBe(true);
      expect(await grid.getByRole('row').nth(1).textContent()).toContain('Move requested');
      // Searching by the quote's number alone finds it too.
      await page
        .getByLabel('Search bookings')
        .fill(String(Number(requested.quote.reference.slice(2))));
      await expect.poll(() => link.isVisible()).toBe(true);

      // 2. The booking: state, customer, quote; Confirm.
      await link.click();
      await page.waitForURL(new RegExp(`/desk/bookings/${requested.id}$`));
      const status = page.getByRole('region', { name: 'Status', exact: true });
      await expect
        .poll(() => status.getByText('Requested', { exact: true }).isVisible())
        .toBe(true);
      expect(
        await page.getByRole('region', { name: 'Customer', exact: true }).textContent(),
      ).toContain(requested.customer.email);
      expect(
        await page
          .getByRole('region', { name: 'Quote', exact: true })
          .getByRole('link', { name: new RegExp(`^${requested.quote.reference}, version`) })
          .getAttribute('href'),
      ).toBe(`/desk/quotes/${requested.quote.id}`);
      const needsDesk = page.getByRole('region', { name: 'Needs the desk' });
      expect(await needsDesk.textContent()).toContain(asked);
      // The audit trail has the hold, the deposit and the customer's request, in that order.
      const trail = page.getByRole('region', { name: 'Audit trail', exact: true });
      const trailText = (await trail.textContent()) ?? '';
      expect(trailText.indexOf('Time held')).toBeGreaterThanOrEqual(0);
      expect(trailText.indexOf('Move requested')).toBeGreaterThan(trailText.indexOf('Time held'));
      await record(page, 'booking-detail');
      await status.getByRole('button', { name: 'Confirm', exact: true }).click();
      await expect
        .poll(() => status.getByText('Confirmed', { exact: true }).isVisible(), { timeout: 15_000 })
        .toBe(true);
      expect((await readBooking(page, requested.id)).state).toBe('confirmed');
      expect(await status.getByRole('button', { name: 'Vehicle in, start work' }).count()).toBe(1);

      // 3. Move it to a start on another day, among those the API offers.
      const availability = await getJson<Availability>(
        page,
        `/api/availability?quoteVersionId=${requested.quote.versionId}&days=14`,
      );
      expect(availability.status).toBe(200);
      const presentDay = localDate(requested.startUtc, timeZone);
      const firstDay = availability.body.days.find((day) => day.starts.length > 0)?.date ?? '';
      const otherDays = availability.body.days.filter(
        (day) => day.starts.length > 0 && day.date !== presentDay,
      );
      const target =
        otherDays.find((day) => day.date.slice(0, 7) === firstDay.slice(0, 7)) ?? otherDays[0];
      expect(target, 'another day with a free start in the next two weeks').toBeDefined();
      const newStart = target.starts[0];
      await status.getByRole('button', { name: 'Move', exact: true }).click();
      const dialog = page.getByRole('dialog', { name: `Pick another time for ${reference}` });
      await expect.poll(() => dialog.isVisible()).toBe(true);
      if (target.date.slice(0, 7) !== firstDay.slice(0, 7)) {
        await dialog.getByRole('button', { name: 'Next month' }).click();
      }
      const dayCell = dialog.getByRole('gridcell', {
        name: new RegExp(`^${longDate(target.date)}:`),
      });
      await expect.poll(() => dayCell.isEnabled()).toBe(true);
      await dayCell.click();
      const times = dialog.getByRole('group', { name: `Start times on ${longDate(target.date)}` });
      await times.getByRole('button', { name: clockPattern(newStart.localTime) }).click();
      await dialog.getByRole('button', { name: 'Move to this time' }).click();
      await expect.poll(() => dialog.isVisible(), { timeout: 15_000 }).toBe(false);
      const moved = await readBooking(page, requested.id);
      expect(moved.startUtc).toBe(newStart.startUtc);
      expect(moved.state).toBe('confirmed');
      // The trail says what was moved where; the request is answered (no longer waiting).
      await expect
        .poll(
          async () =>
            (await page.getByRole('region', { name: 'Audit trail', exact: true }).textContent()) ??
            '',
        )
        .toMatch(/Moved from .+ to /);
      await expect
        .poll(async () => (await needsDesk.textContent()) ?? '')
        .not.toContain('The customer asks to move it');

      // The customer sees the confirmation and the move, and that their request was answered.
      await customerSide.page.goto(`/account/bookings/${requested.id}`);
      const moves = customerSide.page.getByRole('region', { name: 'Moves' });
      await expect.poll(() => moves.isVisible()).toBe(true);
      expect(await moves.textContent()).toMatch(/Moved from .+ to /);
      expect(
        await customerSide.page.getByText('Your request to move was answered').isVisible(),
      ).toBe(true);
      expect(await customerSide.page.getByText(/^Confirmed by the workshop on /).isVisible()).toBe(
        true,
      );
      await record(customerSide.page, 'customer-booking');

      // 4. The day board on the new day: the block in its bay, and it opens the booking.
      await page.getByRole('link', { name: 'This day on the board' }).click();
      await page.waitForURL(/\/desk\/board/);
      const board = page.getByRole('region', { name: new RegExp(longDate(target.date)) });
      const block = board.getByRole('link', { name: new RegExp(`^${reference}, Confirmed`) });
      await expect.poll(() => block.first().isVisible()).toBe(true);
      const blockName = (await block.first().getAttribute('aria-label')) ?? '';
      expect(blockName).toContain(requested.customer.name);
      expect(blockName).toContain(requested.quote.reference);
      // Blocks sit in their bay's column by their times: none overlaps another in its bay, and
      // the booking's own blocks are at least a line of text tall.
      const boxes = (
        await Promise.all(
          (await board.getByRole('link', { name: /^B-\d+, / }).all()).map((each) =>
            each.boundingBox(),
          ),
        )
      ).filter((box): box is NonNullable<typeof box> => box !== null);
      for (const a of boxes) {
        for (const b of boxes) {
          if (a === b || Math.abs(a.x - b.x) > 1) continue;
          const overlap = Math.min(a.y + a.height, b.y + b.height) - Math.max(a.y, b.y);
          expect(overlap, 'two blocks in one bay overlap').toBeLessThanOrEqual(0);
        }
      }
      for (const own of await block.all()) {
        expect((await own.boundingBox())?.height ?? 0).toBeGreaterThanOrEqual(18);
      }
      await record(page, 'day-board');

      // 5. The week: the day lists the booking with its start time and bays.
      await page.getByRole('button', { name: 'Week', exact: true }).click();
      await page.waitForURL(/view=week/);
      const weekDay = page.getByRole('listitem', {
        name: new RegExp(`^${shortDate(target.date)}`),
      });
      const weekEntry = weekDay.getByRole('link', { name: new RegExp(requested.quote.reference) });
      await expect.poll(() => weekEntry.isVisible()).toBe(true);
      const entryText = (await weekEntry.textContent()) ?? '';
      expect(entryText).toContain(requested.customer.name);
      expect(entryText).toContain(moved.segments[0].bayName);
      await record(page, 'week-board');

      await page.getByRole('button', { name: 'Day', exact: true }).click();
      await expect.poll(() => block.first().isVisible()).toBe(true);
      await block.first().click();
      await page.waitForURL(new RegExp(`/desk/bookings/${requested.id}$`));

      // 6. The vehicle comes in: marked arrived, the trail says so, and the next step is work.
      const statusAgain = page.getByRole('region', { name: 'Status', exact: true });
      await statusAgain.getByRole('button', { name: 'Mark arrived' }).click();
      await expect
        .poll(() => statusAgain.getByText(/^Vehicle in since /).isVisible(), { timeout: 15_000 })
        .toBe(true);
      expect(
        await statusAgain.getByRole('button', { name: 'Start work', exact: true }).count(),
      ).toBe(1);
      expect(await statusAgain.getByRole('button', { name: 'Mark arrived' }).count()).toBe(0);
      expect((await readBooking(page, requested.id)).arrivedAt).not.toBeNull();
      expect(
        await page.getByRole('region', { name: 'Audit trail', exact: true }).textContent(),
      ).toContain('Vehicle arrived');
    } finally {
      await context.close();
      await customerSide.context.close();
    }
  }, 240_000);
});
