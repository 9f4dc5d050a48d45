import { describe, expect, it } from 'vitest';
import { newPage } from '../support/browser';
import { journey } from '../support/journey';
import { findBookablePackage } from '../support/booking-setup';
import { demoUsers } from '../support/env';
import { getJson, mainNavigation, postJson, signIn } from '../support/session';

const JOURNEY = 'book-a-time';

type BayKind = 'hoist' | 'alignment' | 'tyre';

interface Quote {
  id: string;
  reference: string;
  versions: { id: string; number: number; bookable: boolean }[];
}

interface PlannedSegment {
  bayName: string;
  bayKind: BayKind;
  minutes: number;
  startUtc: string;
  endUtc: string;
}

interface StartOption {
  startUtc: string;
  endUtc: string;
  localTime: string;
  segments: PlannedSegment[];
}

interface Availability {
  quoteVersionId: string;
  timeZone: string;
  holdMinutes: number;
  plan: { segments: { bayKind: BayKind; minutes: number }[]; earliestStartDate: string };
  days: { date: string; closedReason: string | null; starts: StartOption[] }[];
}

interface Booking {
  id: string;
  reference: string;
  state: string;
  startUtc: string;
  holdExpiresAt: string | null;
  quote: { id: string; reference: string };
}

interface WorkshopSetup {
  timeZone: string;
  bays: { name: string }[];
}

/** A workshop-local date "YYYY-MM-DD" in words, by this Node process's Intl (not the app's). */
function dayInWords(isoDate: string): string {
  const [year, month, day] = isoDate.split('-').map(Number);
  return new Intl.DateTimeFormat('en-AU', {
    weekday: 'long',
    day: 'numeric',
    month: 'long',
    timeZone: 'UTC',
  }).format(new Date(Date.UTC(year, month - 1, day)));
}

/** An instant on the workshop's clock ("7:30 am"), by this Node process's Intl. */
function clockInWords(isoInstant: string, timeZone: string): string {
  return new Intl.DateTimeFormat('en-AU', { hour: 'numeric', minute: '2-digit', timeZone })
    .format(new Date(isoInstant))
    .toLowerCase();
}

/** "7:30 am" as a pattern that also takes the narrow no-break space some ICU versions print. */
function clockPattern(text: string): RegExp {
  return new RegExp(`^${text.replace(/\s+/g, '\\s*')}$`, 'i');
}

const { browser: currentBrowser, record } = journey(JOURNEY);

describe('a customer books a time for a saved quote', () => {
  it('opens the Book step, picks the first free day and a time, holds it, and sees the countdown (phone)', async () => {
    const { context, page } = await newPage(currentBrowser(), 'phone');
    // Every availability answer the page gets, newest last (the one on screen).
    const answers: Availability[] = [];
    page.on('response', (response) => {
      if (!response.url().includes('/api/availability?') || response.status() !== 200) return;
      void response
        .json()
        .then((body: Availability) => answers.push(body))
        .catch(() => undefined);
    });
    try {
      // Set-up through the API: a new customer and a saved quote of theirs.
      await page.goto('/');
      const email = `booker.${Date.now()}@example.test`;
      const registered = await postJson(page, '/api/auth/register', {
        email,
        password: 'a-long-enough-passphrase',
        name: 'Kit Booker',
      });
      expect(registered.status).toBe(201);
      const { vehicle, items } = await findBookablePackage(page);
      const saved = await postJson<Quote>(page, '/api/quotes', {
        vehicleModelId: vehicle.id,
        vehicleYear: vehicle.yearTo,
        uses: ['daily'],
        constantLoadKg: 0,
        items,
      });
      expect(saved.status, JSON.stringify(saved.body)).toBe(201);
      const quote = saved.body;
      const version = [...quote.versions].sort((a, b) => b.number - a.number)[0];
      expect(version.bookable).toBe(true);

      // 1. The quote offers "Book a time", which opens the planner's Book step.
      await page.goto(`/account/quotes/${quote.id}`);
      await page.getByRole('link', { name: 'Book a time' }).first().click();
      await page.waitForURL(`**/plan/book/${quote.id}`);
      await expect
        .poll(() => page.getByRole('heading', { level: 1, name: 'Book a time' }).isVisible())
        .toBe(true);
      await expect.poll(() => page.getByRole('heading', { level: 1 }).count()).toBe(1);

      // 2. What the job needs, as the API planned it: every bay kind it uses is named.
      await expect.poll(() => answers.length).toBeGreaterThan(0);
      const needs = page.getByRole('region', { name: 'What the job needs' });
      for (const segment of answers[0].plan.segments) {
        await expect
          .poll(async () => (await needs.textContent())?.toLowerCase() ?? '')
          .toContain(`${segment.bayKind} bay`);
      }

      // 3. The first day with a start is picked; its start times are the API's, as buttons.
      const timesHeading = page.getByRole('heading', { name: /^Start times on / });
      await expect.poll(() => timesHeading.isVisible()).toBe(true);
      const shown = answers.filter((answer) => answer.days.some((day) => day.starts.length > 0));
      expect(shown.length, 'a window with free starts').toBeGreaterThan(0);
      const availability = shown[shown.length - 1];
      const firstDay = availability.days.find((day) => day.starts.length > 0)!;
      const dayName = dayInWords(firstDay.date);
      await page
        .getByRole('gridcell', { name: new RegExp(`^${dayName}:`) })
        .first()
        .click();
      await expect.poll(() => timesHeading.textContent()).toBe(`Start times on ${dayName}`);
      const times = page.getByRole('group', { name: `Start times on ${dayName}` });
      await expect.poll(() => times.getByRole('button').count()).toBe(firstDay.starts.length);
      // Days without a start cannot be picked, and say why.
      const closedDay = availability.days.find((day) => day.closedReason !== null);
      if (closedDay) {
        const cell = page.getByRole('gridcell', {
          name: `${dayInWords(closedDay.date)}: ${closedDay.closedReason}`,
        });
        if ((await cell.count()) > 0) expect(await cell.first().isDisabled()).toBe(true);
      }
      await record(page, 'book-step-day-picked');

      // 4. The first time: what it covers, each bay with its own from–to on the workshop clock.
      const start = firstDay.starts[0];
      const timeText = clockInWords(start.startUtc, availability.timeZone);
      await times.getByRole('button', { name: clockPattern(timeText) }).click();
      const covers = page.getByRole('region', { name: 'What this time covers' });
      await expect.poll(() => covers.isVisible()).toBe(true);
      for (const segment of start.segments) {
        await expect.poll(() => covers.getByText(segment.bayName).first().isVisible()).toBe(true);
      }
      await record(page, 'book-step-time-picked');

      // 5. Hold it: the booking opens, held for that start, with a countdown.
      await covers.getByRole('button', { name: 'Hold this time' }).click();
      await page.waitForURL(/\/account\/bookings\/[0-9a-f-]{36}$/);
      const bookingId = new URL(page.url()).pathname.split('/').pop() as string;
      const booking = await getJson<Booking>(page, `/api/bookings/${bookingId}`);
      expect(booking.status).toBe(200);
      expect(booking.body.state).toBe('held');
      expect(Date.parse(booking.body.startUtc)).toBe(Date.parse(start.startUtc));
      expect(booking.body.quote.id).toBe(quote.id);
      expect(booking.body.holdExpiresAt).not.toBeNull();
      await expect
        .poll(() =>
          page
            .getByRole('heading', { level: 1, name: `Booking ${booking.body.reference}` })
            .isVisible(),
        )
        .toBe(true);
      const timer = page.getByRole('timer');
      await expect.poll(() => timer.textContent()).toMatch(/^Held for \d+:\d{2} more$/);
      const minutesShown = Number(/(\d+):/.exec((await timer.textContent()) ?? '')?.[1]);
      expect(minutesShown).toBeLessThanOrEqual(availability.holdMinutes);
      // It counts down.
      const before = await timer.textContent();
      await expect.poll(() => timer.textContent(), { timeout: 5_000 }).not.toBe(before);
      await expect
        .poll(() => page.getByRole('button', { name: 'Release this time' }).isVisible())
        .toBe(true);
      await record(page, 'held-booking');

      // 6. My bookings lists it.
      await mainNavigation(page).getByRole('link', { name: 'My bookings' }).click();
      await page.waitForURL('**/account/bookings');
      await expect
        .poll(() =>
          page.getByRole('link', { name: new RegExp(booking.body.reference) }).isVisible(),
        )
        .toBe(true);
    } finally {
      await context.close();
    }
  }, 180_000);
});

describe('the manager sets up the workshop', () => {
  it('opens Manage → Workshop (desktop)', async () => {
    const { context, page } = await newPage(currentBrowser(), 'desktop');
    try {
      await signIn(page, demoUsers.manager);
      await page.waitForURL('**/manage');
      await mainNavigation(page).getByRole('link', { name: 'Workshop' }).click();
      await page.waitForURL('**/manage/workshop');
      await expect
        .poll(() => page.getByRole('heading', { level: 1, name: 'Workshop' }).isVisible())
        .toBe(true);
      const setup = await getJson<WorkshopSetup>(page, '/api/workshop/setup');
      expect(setup.status).toBe(200);
      await expect
        .poll(() => page.getByRole('combobox', { name: 'Time zone' }).inputValue())
        .toBe(setup.body.timeZone.replace(/_/g, ' '));
      for (const bay of setup.body.bays) {
        await expect
          .poll(() => page.getByRole('rowheader', { name: new RegExp(bay.name) }).count())
          .toBeGreaterThan(0);
      }
      await expect
        .poll(() => page.getByRole('button', { name: 'Save the calendar' }).isVisible())
        .toBe(true);
      await record(page, 'manage-workshop');
    } finally {
      await context.close();
    }
  }, 90_000);
});
