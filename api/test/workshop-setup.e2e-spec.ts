import { randomUUID } from 'node:crypto';
import { MikroORM, RequestContext } from '@mikro-orm/postgresql';
import { DateTime } from 'luxon';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_BAYS, DEMO_OPENING_HOURS } from '../src/database/seeders/demo-calendar.seeder';
import {
  type WorkshopCalendarSettings,
  WorkshopSetupService,
} from '../src/workshop/workshop-setup.service';
import { productId, vehicleModelId } from './support/catalogue';
import { anonymousSession, registerCustomer, signInAs, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

interface OpeningHoursEntry {
  weekday: number;
  open: boolean;
  opensAt: string | null;
  closesAt: string | null;
  breakStartsAt: string | null;
  breakEndsAt: string | null;
}
interface Bay {
  id: string;
  name: string;
  kind: string;
  position: number;
  active: boolean;
}
interface Closure {
  id: string;
  startDate: string;
  endDate: string;
  reason: string;
}
interface Holiday {
  date: string;
  name: string;
  opens: boolean;
  note: string | null;
}
interface Setup {
  timeZone: string;
  holidayRegion: string;
  slotStepMinutes: number;
  holdMinutes: number;
  leadTimeBufferDays: number;
  fittingMinutesPerWheel: number;
  fullRefundHoursBefore: number;
  lateCancelRefundPercent: number;
  openingHours: OpeningHoursEntry[];
  bays: Bay[];
  closures: Closure[];
  holidays: Holiday[];
  holidayRegions: { code: string; name: string }[];
}
type CalendarBody = Omit<Setup, 'bays' | 'closures' | 'holidays' | 'holidayRegions'>;

const ZONE = 'Australia/Sydney';
const SETUP_TABLES = ['workshop', 'bay', 'opening_hours', 'closure', 'holiday_override'];

/** The demo week as the API gives it: Monday to Saturday from the seeder, Sunday shut. */
const DEMO_WEEK: OpeningHoursEntry[] = [1, 2, 3, 4, 5, 6, 7].map((weekday) => {
  const hours = DEMO_OPENING_HOURS.find((row) => row.weekday === weekday);
  return hours
    ? { ...hours, open: true }
    : {
        weekday,
        open: false,
        opensAt: null,
        closesAt: null,
        breakStartsAt: null,
        breakEndsAt: null,
      };
});

/** The demo calendar (the workshop row's defaults and the seeded week). */
const DEMO_CALENDAR: CalendarBody = {
  timeZone: ZONE,
  holidayRegion: 'AU-NSW',
  slotStepMinutes: 30,
  holdMinutes: 15,
  leadTimeBufferDays: 1,
  fittingMinutesPerWheel: 15,
  fullRefundHoursBefore: 48,
  lateCancelRefundPercent: 0,
  openingHours: DEMO_WEEK,
};

function today(): string {
  return DateTime.now().setZone(ZONE).toISODate() as string;
}

function plusDays(date: string, days: number): string {
  return DateTime.fromISO(date, { zone: 'utc' }).plus({ days }).toISODate() as string;
}

/** The first date on or after today that falls on this month and day ('12-25'). */
function nextOn(monthDay: string): string {
  const now = today();
  const thisYear = `${now.slice(0, 4)}-${monthDay}`;
  return thisYear >= now ? thisYear : `${Number(now.slice(0, 4)) + 1}-${monthDay}`;
}

function withMonday(monday: Partial<OpeningHoursEntry>): CalendarBody {
  return {
    ...DEMO_CALENDAR,
    openingHours: [{ ...DEMO_WEEK[0], ...monday }, ...DEMO_WEEK.slice(1)],
  };
}

describe('workshop set-up (Manage → Workshop)', () => {
  let testApp: TestApp;
  let manager: Session;
  let desk: Session;
  let tech: Session;
  let customer: Session;
  let guest: Session;
  let demoBays: Bay[];
  let demoClosureIds: string[];
  let demoOverrideIds: string[];
  const madeQuotes: string[] = [];
  const madeBookings: string[] = [];

  /** Every row of the set-up tables with its xmin: equal snapshots mean nothing was written. */
  async function snapshot(): Promise<string> {
    const rows: Record<string, unknown> = {};
    for (const table of SETUP_TABLES) {
      rows[table] = (
        await testApp.db.query(`select xmin::text as xmin, * from "${table}" order by id`)
      ).rows;
    }
    return JSON.stringify(rows);
  }

  async function setup(session: Session = manager): Promise<Setup> {
    const response = await session.agent.get('/api/workshop/setup');
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    return response.body as Setup;
  }

  type Method = 'put' | 'post' | 'patch' | 'delete';
  function send(method: Method, path: string, body?: object, session: Session = manager) {
    const call = session.agent[method](path).set('x-csrf-token', session.csrfToken);
    return body === undefined ? call : call.send(body);
  }

  /** A change that must succeed: its answer is the whole set-up, the same as a fresh read. */
  async function change(method: Method, path: string, body?: object): Promise<Setup> {
    const response = await send(method, path, body);
    expect(response.status, JSON.stringify(response.body)).toBe(method === 'post' ? 201 : 200);
    expect(response.body).toEqual(await setup());
    return response.body as Setup;
  }

  /** A refused change: 400 naming exactly these fields, and not a row written. */
  async function refused(
    method: Method,
    path: string,
    body: object,
    fields: string[],
  ): Promise<void> {
    const before = await snapshot();
    const response = await send(method, path, body);
    expect(response.status, `${path} ${JSON.stringify(body)}`).toBe(400);
    expect(Object.keys(response.body.fieldErrors as object), JSON.stringify(body)).toEqual(fields);
    expect(await snapshot()).toBe(before);
  }

  async function calendarFor(fromDate: string, toDate: string): Promise<WorkshopCalendarSettings> {
    const orm = testApp.app.get<MikroORM>(MikroORM);
    const service = testApp.app.get(WorkshopSetupService);
    return RequestContext.create(orm.em, () => service.calendarFor(fromDate, toDate));
  }

  async function bayNamed(name: string): Promise<Bay> {
    const bay = (await setup()).bays.find((candidate) => candidate.name === name);
    if (!bay) throw new Error(`No bay named ${name}`);
    return bay;
  }

  beforeAll(async () => {
    testApp = await startTestApp();
    manager = await signInAs(testApp, 'manager');
    desk = await signInAs(testApp, 'desk');
    tech = await signInAs(testApp, 'tech');
    customer = await signInAs(testApp, 'customer');
    guest = await anonymousSession(testApp);
    demoBays = (await setup()).bays;
    const ids = async (table: string) =>
      (await testApp.db.query<{ id: string }>(`select id from "${table}"`)).rows.map((r) => r.id);
    demoClosureIds = await ids('closure');
    demoOverrideIds = await ids('holiday_override');
  });

  afterAll(async () => {
    // Back to the demo set-up: other suites share the database.
    await testApp.db.query('delete from booking where id = any($1)', [madeBookings]);
    await testApp.db.query('delete from quote where id = any($1)', [madeQuotes]);
    await testApp.db.query('delete from bay where not (id = any($1))', [
      demoBays.map((bay) => bay.id),
    ]);
    for (const bay of demoBays) {
      await testApp.db.query(
        'update bay set name = $2, kind = $3, position = $4, active = $5 where id = $1',
        [bay.id, bay.name, bay.kind, bay.position, bay.active],
      );
    }
    await testApp.db.query('delete from closure where not (id = any($1))', [demoClosureIds]);
    await testApp.db.query('delete from holiday_override where not (id = any($1))', [
      demoOverrideIds,
    ]);
    await send('put', '/api/workshop/calendar', DEMO_CALENDAR).expect(200);
    await testApp.close();
  });

  describe('who may see and change it', () => {
    const writes: Array<[Method, string, object]> = [
      ['put', '/api/workshop/calendar', DEMO_CALENDAR],
      ['post', '/api/workshop/bays', { name: 'Hoist 9', kind: 'hoist' }],
      ['patch', `/api/workshop/bays/${randomUUID()}`, { active: false }],
      ['post', '/api/workshop/closures', { startDate: today(), endDate: today(), reason: 'X' }],
      ['delete', `/api/workshop/closures/${randomUUID()}`, {}],
      ['put', `/api/workshop/holidays/${nextOn('12-25')}`, { opens: true }],
    ];

    it('shows the set-up to the desk and the manager only', async () => {
      expect(await setup(desk)).toEqual(await setup(manager));
      await guest.agent.get('/api/workshop/setup').expect(401);
      await customer.agent.get('/api/workshop/setup').expect(403);
      await tech.agent.get('/api/workshop/setup').expect(403);
    });

    it('lets only the manager change it: the desk, tech, customer and guest change nothing', async () => {
      const before = await snapshot();
      for (const [method, path, body] of writes) {
        for (const [session, status] of [
          [desk, 403],
          [tech, 403],
          [customer, 403],
          [guest, 401],
        ] as const) {
          const response = await send(method, path, body, session);
          expect(response.status, `${method} ${path}`).toBe(status);
        }
      }
      expect(await snapshot()).toBe(before);
    });
  });

  it('documents its shapes under the names the web client uses', async () => {
    const document = await guest.agent.get('/api/docs-json').expect(200);
    const schemas = (document.body as { components: { schemas: Record<string, unknown> } })
      .components.schemas;
    for (const name of [
      'WorkshopSetupResponse',
      'BayResponse',
      'OpeningHoursEntryResponse',
      'ClosureResponse',
      'HolidayResponse',
      'HolidayRegionResponse',
      'UpdateWorkshopCalendarDto',
      'OpeningHoursEntryDto',
      'CreateBayDto',
      'UpdateBayDto',
      'CreateClosureDto',
      'HolidayOverrideDto',
      'BayKind',
    ]) {
      expect(schemas, name).toHaveProperty([name]);
    }
  });

  describe('the demo set-up', () => {
    it('has the seeded calendar, week and bays, no closures', async () => {
      const demo = await setup();
      const { bays, closures, holidays, holidayRegions, ...calendar } = demo;
      expect(calendar).toEqual(DEMO_CALENDAR);
      expect(bays.map(({ id: _id, ...bay }) => bay)).toEqual(
        DEMO_BAYS.map((bay, index) => ({ ...bay, position: index + 1, active: true })),
      );
      expect(closures).toEqual([]);
      expect(holidays.length).toBeGreaterThan(0);
      // Source: date-holidays 3.37.0 data (its country and state names).
      expect(holidayRegions).toContainEqual({
        code: 'AU-NSW',
        name: 'Australia, New South Wales',
      });
      expect(holidayRegions).toContainEqual({ code: 'NZ', name: 'New Zealand' });
      expect(holidayRegions).toContainEqual({ code: 'AU', name: 'Australia' });
    });

    it('lists the public holidays of the next 12 months for AU-NSW', async () => {
      const { holidays } = await setup();
      const from = today();
      const until = DateTime.fromISO(from).plus({ months: 12 }).toISODate() as string;
      for (const holiday of holidays) {
        expect(holiday.date >= from && holiday.date < until, holiday.date).toBe(true);
        expect(holiday.opens).toBe(false);
        expect(holiday.note).toBeNull();
      }
      const dates = holidays.map((holiday) => holiday.date);
      expect(dates).toEqual([...dates].sort());
      // Source: date-holidays 3.37.0 data, AU-NSW: the holidays on a fixed date, each in any 12
      // months (a weekend one may have an observed day as well).
      for (const [monthDay, name] of [
        ['01-01', "New Year's Day"],
        ['01-26', 'Australia Day'],
        ['04-25', 'Anzac Day'],
        ['12-25', 'Christmas Day'],
        ['12-26', 'Boxing Day'],
      ]) {
        expect(holidays).toContainEqual({ date: nextOn(monthDay), name, opens: false, note: null });
      }
      // Source: date-holidays 3.37.0 data, AU-NSW: the Bank Holiday (August) is of type "bank"
      // and Mother's and Father's Day are observances, not public holidays.
      const names = holidays.map((holiday) => holiday.name);
      expect(names).not.toContain('Bank Holiday');
      expect(names).not.toContain("Mother's Day");
      expect(names).not.toContain("Father's Day");
    });

    it('gives the booking code the demo calendar with the public holidays of the range', async () => {
      const calendar = await calendarFor('2027-12-20', '2028-01-03');
      expect(calendar.timeZone).toBe(ZONE);
      expect([
        calendar.slotStepMinutes,
        calendar.holdMinutes,
        calendar.leadTimeBufferDays,
        calendar.fittingMinutesPerWheel,
      ]).toEqual([30, 15, 1, 15]);
      const weekday = {
        opensAt: '07:30',
        closesAt: '17:00',
        breakStartsAt: '12:00',
        breakEndsAt: '12:30',
      };
      expect(calendar.weeklyHours).toEqual({
        1: weekday,
        2: weekday,
        3: weekday,
        4: weekday,
        5: weekday,
        6: { opensAt: '08:00', closesAt: '12:00', breakStartsAt: null, breakEndsAt: null },
        7: null,
      });
      expect(calendar.bays.map(({ name, kind, position }) => ({ name, kind, position }))).toEqual(
        DEMO_BAYS.map((bay, index) => ({ ...bay, position: index + 1 })),
      );
      // Source: date-holidays 3.37.0 data, AU-NSW 2027: Christmas Day falls on a Saturday and
      // Boxing Day on a Sunday; the substitute days are Monday 27 and Tuesday 28 December.
      // AU-NSW 2028: New Year's Day falls on a Saturday and is observed again on Monday 3 January
      // (under the same name).
      expect([...calendar.closedDates]).toEqual([
        ['2027-12-25', 'Public holiday: Christmas Day'],
        ['2027-12-26', 'Public holiday: Boxing Day'],
        ['2027-12-27', 'Public holiday: Christmas Day (substitute day)'],
        ['2027-12-28', 'Public holiday: Boxing Day (substitute day)'],
        ['2028-01-01', "Public holiday: New Year's Day"],
        ['2028-01-03', "Public holiday: New Year's Day"],
      ]);
      // Source: date-holidays 3.37.0 data, AU-NSW 2027: Good Friday 26 March to Easter Monday 29
      // March; the Bank Holiday of Monday 2 August is not a public holiday.
      expect([...(await calendarFor('2027-03-25', '2027-03-30')).closedDates.keys()]).toEqual([
        '2027-03-26',
        '2027-03-27',
        '2027-03-28',
        '2027-03-29',
      ]);
      expect((await calendarFor('2027-08-01', '2027-08-03')).closedDates.size).toBe(0);
    });
  });

  describe('PUT /api/workshop/calendar', () => {
    it('replaces the settings and the week, and reads back the same', async () => {
      const week: OpeningHoursEntry[] = [
        ...DEMO_WEEK.slice(0, 5),
        {
          weekday: 6,
          open: false,
          opensAt: null,
          closesAt: null,
          breakStartsAt: null,
          breakEndsAt: null,
        },
        {
          weekday: 7,
          open: true,
          opensAt: '09:00',
          closesAt: '13:00',
          breakStartsAt: '10:45',
          breakEndsAt: '11:00',
        },
      ];
      const changed = await change('put', '/api/workshop/calendar', {
        // Spelt in lower case: stored as the IANA database spells it.
        timeZone: 'pacific/auckland',
        holidayRegion: 'NZ',
        slotStepMinutes: 15,
        holdMinutes: 20,
        leadTimeBufferDays: 0,
        fittingMinutesPerWheel: 20,
        // A closed day's times are not kept; the order of the list does not matter.
        openingHours: [
          week[6],
          ...week.slice(0, 5),
          { ...week[5], opensAt: '08:00', closesAt: '12:00' },
        ],
      });
      expect(changed).toMatchObject({
        timeZone: 'Pacific/Auckland',
        holidayRegion: 'NZ',
        slotStepMinutes: 15,
        holdMinutes: 20,
        leadTimeBufferDays: 0,
        fittingMinutesPerWheel: 20,
        openingHours: week,
      });
      // No row for the closed Saturday; Sunday has one.
      const rows = await testApp.db.query<{ weekday: number }>(
        'select weekday from opening_hours order by weekday',
      );
      expect(rows.rows.map((row) => row.weekday)).toEqual([1, 2, 3, 4, 5, 7]);
      // Source: date-holidays 3.37.0 data, NZ: Waitangi Day, 6 February.
      expect(changed.holidays).toContainEqual({
        date: nextOn('02-06'),
        name: 'Waitangi Day',
        opens: false,
        note: null,
      });
      const calendar = await calendarFor('2027-01-01', '2027-01-01');
      expect(calendar.timeZone).toBe('Pacific/Auckland');
      expect(calendar.weeklyHours[6]).toBeNull();
      expect(calendar.weeklyHours[7]).toEqual({
        opensAt: '09:00',
        closesAt: '13:00',
        breakStartsAt: '10:45',
        breakEndsAt: '11:00',
      });

      const demo = await change('put', '/api/workshop/calendar', DEMO_CALENDAR);
      expect(demo).toMatchObject(DEMO_CALENDAR);
    });

    it('sets the cancellation policy with the calendar, and keeps it when left out', async () => {
      const policy = await change('put', '/api/workshop/calendar', {
        ...DEMO_CALENDAR,
        fullRefundHoursBefore: 72,
        lateCancelRefundPercent: 25,
      });
      expect(policy).toMatchObject({ fullRefundHoursBefore: 72, lateCancelRefundPercent: 25 });
      const {
        fullRefundHoursBefore: _hours,
        lateCancelRefundPercent: _percent,
        ...older
      } = DEMO_CALENDAR;
      const kept = await change('put', '/api/workshop/calendar', { ...older, holdMinutes: 20 });
      expect(kept).toMatchObject({
        holdMinutes: 20,
        fullRefundHoursBefore: 72,
        lateCancelRefundPercent: 25,
      });
      expect(await change('put', '/api/workshop/calendar', DEMO_CALENDAR)).toMatchObject(
        DEMO_CALENDAR,
      );
    });

    it('refuses bad settings with field errors and changes nothing', async () => {
      const cases: Array<[object, string[]]> = [
        [{ ...DEMO_CALENDAR, timeZone: 'Nowhere/Tallowgate' }, ['timeZone']],
        [{ ...DEMO_CALENDAR, timeZone: 'local' }, ['timeZone']],
        [{ ...DEMO_CALENDAR, timeZone: 'UTC+10' }, ['timeZone']],
        [{ ...DEMO_CALENDAR, timeZone: 11 }, ['timeZone']],
        [{ ...DEMO_CALENDAR, holidayRegion: 'AU-XYZ' }, ['holidayRegion']],
        [{ ...DEMO_CALENDAR, holidayRegion: 'au-nsw' }, ['holidayRegion']],
        [{ ...DEMO_CALENDAR, slotStepMinutes: 25 }, ['slotStepMinutes']],
        [{ ...DEMO_CALENDAR, slotStepMinutes: '30' }, ['slotStepMinutes']],
        [{ ...DEMO_CALENDAR, holdMinutes: 4 }, ['holdMinutes']],
        [{ ...DEMO_CALENDAR, holdMinutes: 61 }, ['holdMinutes']],
        [{ ...DEMO_CALENDAR, leadTimeBufferDays: -1 }, ['leadTimeBufferDays']],
        [{ ...DEMO_CALENDAR, leadTimeBufferDays: 31 }, ['leadTimeBufferDays']],
        [{ ...DEMO_CALENDAR, leadTimeBufferDays: 1.5 }, ['leadTimeBufferDays']],
        [{ ...DEMO_CALENDAR, fittingMinutesPerWheel: 121 }, ['fittingMinutesPerWheel']],
        [{ ...DEMO_CALENDAR, openingHours: DEMO_WEEK.slice(0, 6) }, ['openingHours']],
        [{ ...DEMO_CALENDAR, openingHours: [...DEMO_WEEK, DEMO_WEEK[0]] }, ['openingHours']],
        [
          { ...DEMO_CALENDAR, openingHours: [...DEMO_WEEK.slice(0, 6), DEMO_WEEK[2]] },
          ['openingHours[6].weekday'],
        ],
        [
          {
            ...DEMO_CALENDAR,
            openingHours: [...DEMO_WEEK.slice(0, 6), { ...DEMO_WEEK[6], weekday: 8 }],
          },
          ['openingHours[6].weekday'],
        ],
        [withMonday({ opensAt: '7:30' }), ['openingHours[0].opensAt']],
        [withMonday({ closesAt: '24:00' }), ['openingHours[0].closesAt']],
        [withMonday({ closesAt: '5:00 pm' }), ['openingHours[0].closesAt']],
        [withMonday({ opensAt: null }), ['openingHours[0].opensAt']],
        [withMonday({ opensAt: '17:00', closesAt: '07:30' }), ['openingHours[0].closesAt']],
        [withMonday({ closesAt: '07:30' }), ['openingHours[0].closesAt']],
        [withMonday({ breakEndsAt: null }), ['openingHours[0].breakEndsAt']],
        [withMonday({ breakStartsAt: null }), ['openingHours[0].breakStartsAt']],
        [withMonday({ breakStartsAt: '06:00' }), ['openingHours[0].breakStartsAt']],
        [
          withMonday({ breakStartsAt: '12:30', breakEndsAt: '12:00' }),
          ['openingHours[0].breakEndsAt'],
        ],
        [
          withMonday({ breakStartsAt: '16:30', breakEndsAt: '17:30' }),
          ['openingHours[0].breakEndsAt'],
        ],
        [withMonday({ open: 'yes' } as unknown as OpeningHoursEntry), ['openingHours[0].open']],
        [{ ...DEMO_CALENDAR, slotStepMinutes: undefined }, ['slotStepMinutes']],
        [{ ...DEMO_CALENDAR, fullRefundHoursBefore: -1 }, ['fullRefundHoursBefore']],
        [{ ...DEMO_CALENDAR, fullRefundHoursBefore: 721 }, ['fullRefundHoursBefore']],
        [{ ...DEMO_CALENDAR, fullRefundHoursBefore: 24.5 }, ['fullRefundHoursBefore']],
        [{ ...DEMO_CALENDAR, fullRefundHoursBefore: null }, ['fullRefundHoursBefore']],
        [{ ...DEMO_CALENDAR, lateCancelRefundPercent: 101 }, ['lateCancelRefundPercent']],
        [{ ...DEMO_CALENDAR, lateCancelRefundPercent: -5 }, ['lateCancelRefundPercent']],
        [{ ...DEMO_CALENDAR, lateCancelRefundPercent: '50' }, ['lateCancelRefundPercent']],
        [{ ...DEMO_CALENDAR, bays: [] }, ['bays']],
      ];
      for (const [body, fields] of cases) {
        await refused('put', '/api/workshop/calendar', body, fields);
      }
      expect(await setup()).toMatchObject(DEMO_CALENDAR);
    });
  });

  describe('bays', () => {
    it('adds a bay last, renames, moves, re-kinds and switches it off and on', async () => {
      let current = await change('post', '/api/workshop/bays', {
        name: '  Hoist 4  ',
        kind: 'hoist',
      });
      const added = current.bays.find((bay) => bay.name === 'Hoist 4');
      expect(added).toMatchObject({ kind: 'hoist', position: 6, active: true });
      const id = added!.id;

      current = await change('patch', `/api/workshop/bays/${id}`, {
        name: 'Hoist 4 (heavy)',
        position: 2,
      });
      expect(current.bays.map((bay) => [bay.name, bay.position])).toEqual([
        ['Hoist 1', 1],
        ['Hoist 4 (heavy)', 2],
        ['Hoist 2', 3],
        ['Hoist 3', 4],
        ['Alignment bay', 5],
        ['Tyre bay', 6],
      ]);
      let calendar = await calendarFor(today(), today());
      expect(calendar.bays.map((bay) => bay.name)).toEqual([
        'Hoist 1',
        'Hoist 4 (heavy)',
        'Hoist 2',
        'Hoist 3',
        'Alignment bay',
        'Tyre bay',
      ]);

      current = await change('patch', `/api/workshop/bays/${id}`, { kind: 'tyre', active: false });
      expect(current.bays.find((bay) => bay.id === id)).toMatchObject({
        kind: 'tyre',
        active: false,
        position: 2,
      });
      // A switched-off bay is offered for nothing.
      calendar = await calendarFor(today(), today());
      expect(calendar.bays.map((bay) => bay.id)).not.toContain(id);
      expect(calendar.bays).toHaveLength(5);

      current = await change('patch', `/api/workshop/bays/${id}`, { active: true, position: 6 });
      expect(current.bays.find((bay) => bay.id === id)).toMatchObject({
        active: true,
        position: 6,
      });
      expect(current.bays.slice(0, 5).map((bay) => bay.name)).toEqual(DEMO_BAYS.map((b) => b.name));
    });

    it('refuses bad bays with field errors and changes nothing', async () => {
      const hoist1 = await bayNamed('Hoist 1');
      const bays = (await setup()).bays.length;
      for (const [body, fields] of [
        [{ name: 'hoist 1', kind: 'hoist' }, ['name']],
        [{ name: 'Tyre Bay', kind: 'tyre' }, ['name']],
        [{ name: '   ', kind: 'hoist' }, ['name']],
        [{ name: 'H'.repeat(61), kind: 'hoist' }, ['name']],
        [{ name: 'Paint booth', kind: 'paint' }, ['kind']],
        [{ kind: 'hoist' }, ['name']],
        [{ name: 'Hoist 5', kind: 'hoist', position: 1 }, ['position']],
      ] as Array<[object, string[]]>) {
        await refused('post', '/api/workshop/bays', body, fields);
      }
      const path = `/api/workshop/bays/${hoist1.id}`;
      for (const [body, fields] of [
        [{ name: 'Alignment BAY' }, ['name']],
        [{ name: '' }, ['name']],
        [{ kind: 'lift' }, ['kind']],
        [{ position: 0 }, ['position']],
        [{ position: bays + 1 }, ['position']],
        [{ position: 1.5 }, ['position']],
        [{ active: 'no' }, ['active']],
        [{ id: randomUUID() }, ['id']],
      ] as Array<[object, string[]]>) {
        await refused('patch', path, body, fields);
      }
      await refused('patch', '/api/workshop/bays/not-a-uuid', { active: false }, ['id']);
      const before = await snapshot();
      await send('patch', `/api/workshop/bays/${randomUUID()}`, { active: false }).expect(404);
      expect(await snapshot()).toBe(before);
    });

    it('will not switch off, or change the kind of, a bay with bookings ahead', async () => {
      const owner = await registerCustomer(testApp);
      const quote = await owner.agent
        .post('/api/quotes')
        .set('x-csrf-token', owner.csrfToken)
        .send({
          vehicleModelId: await vehicleModelId(testApp.db, 'Vantrel', 'Strata', 'SR dual cab'),
          uses: ['daily'],
          constantLoadKg: 0,
          items: [{ productId: await productId(testApp.db, 'KW-SVC-ALIGN'), quantity: 1 }],
        });
      expect(quote.status, JSON.stringify(quote.body)).toBe(201);
      const { id: quoteId, versions } = quote.body as { id: string; versions: { id: string }[] };
      madeQuotes.push(quoteId);

      const hoist2 = await bayNamed('Hoist 2');
      const startsAt = DateTime.now().plus({ days: 3 }).startOf('hour');
      const booking = await testApp.db.query<{ id: string }>(
        `insert into booking (id, created_at, updated_at, customer_id, quote_version_id, created_by_id,
                              state, state_changed_at, starts_at, ends_at, plan)
         values (gen_random_uuid(), now(), now(), $1, $2, $1, 'confirmed', now(), $3, $4, $5)
         returning id`,
        [
          owner.id,
          versions[0].id,
          startsAt.toJSDate(),
          startsAt.plus({ hours: 1 }).toJSDate(),
          JSON.stringify({
            segments: [{ bayKind: 'hoist', minutes: 60, descriptions: ['Test work'] }],
            totalMinutes: 60,
            longestLeadDays: 0,
            earliestStartDate: today(),
          }),
        ],
      );
      const bookingId = booking.rows[0].id;
      madeBookings.push(bookingId);
      const reservation = await testApp.db.query<{ id: string }>(
        `insert into reservation (id, created_at, updated_at, booking_id, bay_id, starts_at, ends_at, active)
         values (gen_random_uuid(), now(), now(), $1, $2, $3, $4, true) returning id`,
        [bookingId, hoist2.id, startsAt.toJSDate(), startsAt.plus({ hours: 1 }).toJSDate()],
      );

      const path = `/api/workshop/bays/${hoist2.id}`;
      for (const body of [
        { active: false },
        { kind: 'alignment' },
        { name: 'Hoist 2b', active: false },
      ]) {
        const before = await snapshot();
        const response = await send('patch', path, body);
        expect(response.status, JSON.stringify(body)).toBe(409);
        expect(response.body.message).toContain('Hoist 2 has a booking from now on');
        expect(response.body.message).toContain(
          startsAt.setZone(ZONE).setLocale('en-AU').toFormat('d LLLL yyyy'),
        );
        expect(await snapshot()).toBe(before);
      }
      // Renaming or moving it is fine while booked.
      await change('patch', path, { name: 'Hoist 2b' });
      await change('patch', path, { name: 'Hoist 2' });

      // A released reservation, or one that has ended, keeps nothing from being switched off.
      await testApp.db.query('update reservation set active = false where id = $1', [
        reservation.rows[0].id,
      ]);
      expect((await change('patch', path, { active: false })).bays).toContainEqual({
        ...hoist2,
        active: false,
      });
      await change('patch', path, { active: true });
      await testApp.db.query(
        `update reservation set active = true, starts_at = now() - interval '3 hours',
                ends_at = now() - interval '2 hours' where id = $1`,
        [reservation.rows[0].id],
      );
      await change('patch', path, { active: false });
      await change('patch', path, { active: true });
      expect(await bayNamed('Hoist 2')).toEqual(hoist2);
    });
  });

  describe('closures and public holidays', () => {
    it('adds a closure that shuts its dates, and removes it', async () => {
      const start = plusDays(today(), 10);
      const end = plusDays(today(), 12);
      const current = await change('post', '/api/workshop/closures', {
        startDate: start,
        endDate: end,
        reason: ' Stocktake ',
      });
      expect(current.closures).toEqual([
        { id: expect.any(String), startDate: start, endDate: end, reason: 'Stocktake' },
      ]);
      const calendar = await calendarFor(plusDays(start, -1), plusDays(end, 1));
      for (const date of [start, plusDays(start, 1), end]) {
        expect(calendar.closedDates.get(date), date).toBe('Closed: Stocktake');
      }
      expect(calendar.closedDates.has(plusDays(start, -1))).toBe(false);
      expect(calendar.closedDates.has(plusDays(end, 1))).toBe(false);
      // A range that only overlaps the closure lists only its own dates.
      expect([...(await calendarFor(end, plusDays(end, 1))).closedDates]).toEqual([
        [end, 'Closed: Stocktake'],
      ]);

      const [{ id }] = current.closures;
      expect((await change('delete', `/api/workshop/closures/${id}`)).closures).toEqual([]);
      expect((await calendarFor(start, end)).closedDates.size).toBe(0);
      const before = await snapshot();
      await send('delete', `/api/workshop/closures/${id}`).expect(404);
      expect(await snapshot()).toBe(before);
    });

    it('refuses bad closures with field errors and changes nothing', async () => {
      const start = plusDays(today(), 5);
      const good = { startDate: start, endDate: start, reason: 'Staff training' };
      for (const [body, fields] of [
        [{ ...good, endDate: plusDays(start, -1) }, ['endDate']],
        [{ ...good, startDate: '2027-02-29', endDate: '2027-03-01' }, ['startDate']],
        [{ ...good, endDate: '2027-13-01' }, ['endDate']],
        [{ ...good, startDate: '4/1/2027' }, ['startDate']],
        [
          { ...good, startDate: plusDays(today(), -3), endDate: plusDays(today(), -1) },
          ['endDate'],
        ],
        [{ ...good, reason: '  ' }, ['reason']],
        [{ ...good, reason: 'R'.repeat(121) }, ['reason']],
        [{ startDate: start, endDate: start }, ['reason']],
      ] as Array<[object, string[]]>) {
        await refused('post', '/api/workshop/closures', body, fields);
      }
      await refused('delete', '/api/workshop/closures/42', {}, ['id']);
    });

    it('opens on a public holiday when asked, and shuts on it again', async () => {
      const christmas = nextOn('12-25');
      const boxingDay = nextOn('12-26');
      const current = await change('put', `/api/workshop/holidays/${christmas}`, {
        opens: true,
        note: ' Open for tyre call-outs ',
      });
      // Source: date-holidays 3.37.0 data, AU-NSW: Christmas Day, 25 December.
      expect(current.holidays.filter((holiday) => holiday.date === christmas)).toEqual([
        { date: christmas, name: 'Christmas Day', opens: true, note: 'Open for tyre call-outs' },
      ]);
      let calendar = await calendarFor(christmas, boxingDay);
      expect(calendar.closedDates.has(christmas)).toBe(false);
      // Source: date-holidays 3.37.0 data, AU-NSW: Boxing Day, 26 December.
      expect(calendar.closedDates.get(boxingDay)).toBe('Public holiday: Boxing Day');

      // A closure over an opened holiday shuts it all the same.
      const closed = await change('post', '/api/workshop/closures', {
        startDate: christmas,
        endDate: christmas,
        reason: 'Family day',
      });
      calendar = await calendarFor(christmas, boxingDay);
      expect(calendar.closedDates.get(christmas)).toBe('Closed: Family day');
      await change('delete', `/api/workshop/closures/${closed.closures[0].id}`);

      // Asked again: the note changes, no second row.
      await change('put', `/api/workshop/holidays/${christmas}`, { opens: true });
      const rows = await testApp.db.query('select date, note from holiday_override');
      expect(rows.rows).toEqual([{ date: christmas, note: null }]);

      const shut = await change('put', `/api/workshop/holidays/${christmas}`, {
        opens: false,
        note: 'ignored',
      });
      expect(shut.holidays.filter((holiday) => holiday.date === christmas)).toEqual([
        { date: christmas, name: 'Christmas Day', opens: false, note: null },
      ]);
      expect((await testApp.db.query('select * from holiday_override')).rows).toEqual([]);
      calendar = await calendarFor(christmas, christmas);
      expect(calendar.closedDates.get(christmas)).toBe('Public holiday: Christmas Day');
    });

    it('refuses a day that is no public holiday of the region, and changes nothing', async () => {
      // Source: date-holidays 3.37.0 data, AU-NSW: no public holiday falls on 10 December.
      await refused('put', `/api/workshop/holidays/${nextOn('12-10')}`, { opens: true }, ['date']);
      // Source: date-holidays 3.37.0 data, NZ: Waitangi Day (6 February) is no AU-NSW holiday.
      await refused('put', `/api/workshop/holidays/${nextOn('02-06')}`, { opens: true }, ['date']);
      await refused('put', '/api/workshop/holidays/2027-02-30', { opens: true }, ['date']);
      await refused('put', '/api/workshop/holidays/christmas', { opens: true }, ['date']);
      // Source: date-holidays 3.37.0 data, AU-NSW: Christmas Day, 25 December.
      const lastChristmas = `${Number(today().slice(0, 4)) - 1}-12-25`;
      await refused('put', `/api/workshop/holidays/${lastChristmas}`, { opens: true }, ['date']);
      const christmas = nextOn('12-25');
      await refused('put', `/api/workshop/holidays/${christmas}`, {}, ['opens']);
      await refused('put', `/api/workshop/holidays/${christmas}`, { opens: 'true' }, ['opens']);
      await refused(
        'put',
        `/api/workshop/holidays/${christmas}`,
        { opens: true, note: 'N'.repeat(121) },
        ['note'],
      );
    });
  });
});
