import { UniqueConstraintViolationException } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/postgresql';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { FieldErrorsException } from '../common/errors/field-errors.exception';
import { closedDatesFor } from '../scheduling/closed-dates';
import { addDays, assertIsoDate } from '../scheduling/local-date';
import { holidayRegions, publicHolidays } from '../scheduling/public-holidays';
import type { BayRef, WorkshopCalendar } from '../scheduling/scheduling.types';
import {
  dayHoursOf,
  openingHoursEntriesOf,
  openingHoursFieldErrors,
  weeklyHoursOf,
} from './calendar-rules';
import type { CreateBayDto } from './dto/create-bay.dto';
import type { CreateClosureDto } from './dto/create-closure.dto';
import type { HolidayOverrideDto } from './dto/holiday-override.dto';
import type { UpdateBayDto } from './dto/update-bay.dto';
import type { UpdateWorkshopCalendarDto } from './dto/update-workshop-calendar.dto';
import type { WorkshopSetupResponse } from './dto/workshop-setup.response';
import { Bay } from './entities/bay.entity';
import { Closure } from './entities/closure.entity';
import { HolidayOverride } from './entities/holiday-override.entity';
import { OpeningHours } from './entities/opening-hours.entity';
import type { Workshop } from './entities/workshop.entity';
import {
  addCalendarMonths,
  canonicalTimeZone,
  localDateOf,
  longDate,
  todayLocalDate,
} from './workshop-time';
import { loadWorkshop } from './workshop.service';

/** What the booking code needs of the workshop's calendar for a range of local dates. */
export interface WorkshopCalendarSettings {
  /** IANA zone name. */
  timeZone: string;
  slotStepMinutes: number;
  holdMinutes: number;
  leadTimeBufferDays: number;
  fittingMinutesPerWheel: number;
  /** ISO weekday → hours ('HH:mm'); null: closed that weekday. */
  weeklyHours: WorkshopCalendar['weeklyHours'];
  /**
   * Local date → reason, for the dates of the range the workshop is shut: its closures
   * ("Closed: stocktake") and the public holidays of its region it does not open on
   * ("Public holiday: Christmas Day"). A closure wins over a holiday it opens on.
   */
  closedDates: Map<string, string>;
  /** Bays switched on, by position. */
  bays: BayRef[];
}

/** Public holidays are listed for this many months from the workshop's today. */
const HOLIDAY_LIST_MONTHS = 12;

function sameName(a: string, b: string): boolean {
  return a.localeCompare(b, 'en', { sensitivity: 'accent' }) === 0;
}

function duplicateNameException(name: string): FieldErrorsException {
  return new FieldErrorsException(
    { name: [`another bay is already called "${name}"`] },
    'Each bay needs its own name',
  );
}

/**
 * Manage → Workshop: the calendar settings and weekly hours, the bays, closures and the public
 * holidays the workshop opens on. Every change runs in one transaction that first locks the
 * workshop row (set-up changes happen one after the other) and answers the whole set-up as
 * that transaction sees it; a refused change leaves everything as it was.
 */
@Injectable()
export class WorkshopSetupService {
  constructor(private readonly em: EntityManager) {}

  async setup(): Promise<WorkshopSetupResponse> {
    return this.setupOf(this.em, await loadWorkshop(this.em));
  }

  /**
   * Replaces the calendar settings and the week's hours (a closed day keeps no row), and the
   * cancellation policy's fields that are given.
   */
  async updateCalendar(dto: UpdateWorkshopCalendarDto): Promise<WorkshopSetupResponse> {
    const errors = openingHoursFieldErrors(dto.openingHours);
    if (Object.keys(errors).length > 0) {
      throw new FieldErrorsException(errors, 'The opening hours are not consistent');
    }
    return this.change(async (em, workshop) => {
      workshop.timeZone = canonicalTimeZone(dto.timeZone);
      workshop.holidayRegion = dto.holidayRegion;
      workshop.slotStepMinutes = dto.slotStepMinutes;
      workshop.holdMinutes = dto.holdMinutes;
      workshop.leadTimeBufferDays = dto.leadTimeBufferDays;
      workshop.fittingMinutesPerWheel = dto.fittingMinutesPerWheel;
      if (dto.fullRefundHoursBefore !== undefined) {
        workshop.fullRefundHoursBefore = dto.fullRefundHoursBefore;
      }
      if (dto.lateCancelRefundPercent !== undefined) {
        workshop.lateCancelRefundPercent = dto.lateCancelRefundPercent;
      }

      const rows = await em.find(OpeningHours, {});
      for (const entry of dto.openingHours) {
        const row = rows.find((candidate) => candidate.weekday === entry.weekday);
        if (!entry.open) {
          if (row) em.remove(row);
          continue;
        }
        // Rows are changed in place (no delete and insert of the same weekday in one flush).
        const hours = dayHoursOf(entry);
        if (row) {
          Object.assign(row, hours);
        } else {
          em.persist(new OpeningHours({ weekday: entry.weekday, ...hours }));
        }
      }
    });
  }

  /** A new bay, switched on, placed after the others. */
  async createBay(dto: CreateBayDto): Promise<WorkshopSetupResponse> {
    return this.change(async (em) => {
      const bays = await em.find(Bay, {}, { orderBy: { position: 'asc' } });
      if (bays.some((bay) => sameName(bay.name, dto.name))) throw duplicateNameException(dto.name);
      const last = bays.reduce((highest, bay) => Math.max(highest, bay.position), 0);
      em.persist(new Bay({ name: dto.name, kind: dto.kind, position: last + 1 }));
    });
  }

  /**
   * Renames a bay, changes its kind, moves it in the order (the others close up) or switches
   * it on or off. Switching off or changing the kind of a bay with bookings ahead is refused.
   */
  async updateBay(id: string, dto: UpdateBayDto): Promise<WorkshopSetupResponse> {
    return this.change(async (em, workshop) => {
      const bays = await em.find(Bay, {}, { orderBy: { position: 'asc', name: 'asc' } });
      const bay = bays.find((candidate) => candidate.id === id);
      if (!bay) throw new NotFoundException('No bay has this id');

      if (
        dto.name != null &&
        bays.some((other) => other !== bay && sameName(other.name, dto.name!))
      ) {
        throw duplicateNameException(dto.name);
      }
      if (dto.position != null && dto.position > bays.length) {
        throw new FieldErrorsException(
          {
            position: [
              `must be from 1 to ${bays.length} (the workshop has ${bays.length} ${bays.length === 1 ? 'bay' : 'bays'})`,
            ],
          },
          'There is no such place in the order of bays',
        );
      }
      const switchingOff = dto.active === false && bay.active;
      const changingKind = dto.kind != null && dto.kind !== bay.kind;
      if (switchingOff || changingKind) {
        await this.refuseWhileBooked(em, bay, workshop.timeZone, switchingOff);
      }

      if (dto.name != null) bay.name = dto.name;
      if (dto.kind != null) bay.kind = dto.kind;
      if (dto.active != null) bay.active = dto.active;
      if (dto.position != null) {
        const order = bays.filter((other) => other !== bay);
        order.splice(dto.position - 1, 0, bay);
        order.forEach((other, index) => {
          if (other.position !== index + 1) other.position = index + 1;
        });
      }
    });
  }

  /** Days the workshop is shut; a closure that is already over is refused. */
  async createClosure(dto: CreateClosureDto): Promise<WorkshopSetupResponse> {
    if (dto.endDate < dto.startDate) {
      throw new FieldErrorsException(
        { endDate: [`must be on or after the start date (${dto.startDate})`] },
        'The closure ends before it starts',
      );
    }
    return this.change((em, workshop) => {
      const today = todayLocalDate(workshop.timeZone);
      if (dto.endDate < today) {
        throw new FieldErrorsException(
          { endDate: [`is in the past (today is ${today} at the workshop)`] },
          'The closure is already over',
        );
      }
      em.persist(
        new Closure({ startDate: dto.startDate, endDate: dto.endDate, reason: dto.reason }),
      );
      return Promise.resolve();
    });
  }

  async deleteClosure(id: string): Promise<WorkshopSetupResponse> {
    return this.change(async (em) => {
      const closure = await em.findOne(Closure, { id });
      if (!closure) throw new NotFoundException('No closure has this id');
      em.remove(closure);
    });
  }

  /**
   * Opens on a public holiday of the workshop's region anyway (its usual hours for that
   * weekday), with a note, or stays shut on it again. Refused for a date that is no public
   * holiday of the region, or that has passed.
   */
  async setHoliday(date: string, dto: HolidayOverrideDto): Promise<WorkshopSetupResponse> {
    return this.change(async (em, workshop) => {
      const today = todayLocalDate(workshop.timeZone);
      if (date < today) {
        throw new FieldErrorsException(
          { date: [`is in the past (today is ${today} at the workshop)`] },
          'That day has passed',
        );
      }
      if (publicHolidays(workshop.holidayRegion, date, date).length === 0) {
        throw new FieldErrorsException(
          { date: [`is not a public holiday in ${workshop.holidayRegion}`] },
          'Only a public holiday can be opened on',
        );
      }
      const override = await em.findOne(HolidayOverride, { date });
      const note = dto.note == null || dto.note === '' ? null : dto.note;
      if (!dto.opens) {
        if (override) em.remove(override);
      } else if (override) {
        override.note = note;
      } else {
        em.persist(new HolidayOverride(date, note));
      }
    });
  }

  /**
   * The calendar the scheduling engine works with, for the local dates fromDate to toDate (both
   * included): settings, the week's hours, the shut dates of the range with their reasons, and
   * the bays switched on, by position.
   */
  async calendarFor(fromDate: string, toDate: string): Promise<WorkshopCalendarSettings> {
    assertIsoDate(fromDate, 'fromDate');
    assertIsoDate(toDate, 'toDate');
    const em = this.em;
    const workshop = await loadWorkshop(em);
    const rows = await em.find(OpeningHours, {});
    const closures = await em.find(
      Closure,
      { startDate: { $lte: toDate }, endDate: { $gte: fromDate } },
      { orderBy: { startDate: 'asc', endDate: 'asc', id: 'asc' } },
    );
    const overrides = await em.find(HolidayOverride, { date: { $gte: fromDate, $lte: toDate } });
    const bays = await em.find(
      Bay,
      { active: true },
      { orderBy: { position: 'asc', name: 'asc' } },
    );
    return {
      timeZone: workshop.timeZone,
      slotStepMinutes: workshop.slotStepMinutes,
      holdMinutes: workshop.holdMinutes,
      leadTimeBufferDays: workshop.leadTimeBufferDays,
      fittingMinutesPerWheel: workshop.fittingMinutesPerWheel,
      weeklyHours: weeklyHoursOf(rows),
      closedDates:
        fromDate > toDate
          ? new Map()
          : closedDatesFor({
              holidays: publicHolidays(workshop.holidayRegion, fromDate, toDate),
              opensOnHolidays: overrides.map((override) => override.date),
              closures,
              fromDate,
              toDate,
            }),
      bays: bays.map((bay) => ({
        id: bay.id,
        name: bay.name,
        kind: bay.kind,
        position: bay.position,
      })),
    };
  }

  /**
   * Runs a change in one transaction with the workshop row locked, then answers the set-up as
   * the transaction sees it. A unique name taken at the same moment is a field error too.
   */
  private async change(
    work: (em: EntityManager, workshop: Workshop) => Promise<void>,
  ): Promise<WorkshopSetupResponse> {
    try {
      return await this.em.transactional(async (em) => {
        const workshop = await loadWorkshop(em, true);
        await work(em, workshop);
        await em.flush();
        return this.setupOf(em, workshop);
      });
    } catch (error) {
      if (
        error instanceof UniqueConstraintViolationException &&
        error.message.includes('bay_name_unique')
      ) {
        throw new FieldErrorsException(
          { name: ['another bay already has this name'] },
          'Each bay needs its own name',
        );
      }
      throw error;
    }
  }

  /**
   * 409 when the bay has active reservations that have not ended (a hold that has lapsed does
   * not count). The bay row is locked first: a reservation being made for it waits, and one
   * already made is seen.
   */
  private async refuseWhileBooked(
    em: EntityManager,
    bay: Bay,
    timeZone: string,
    switchingOff: boolean,
  ): Promise<void> {
    await em.execute('select id from bay where id = ? for update', [bay.id]);
    const now = new Date();
    const [row] = await em.execute<{ bookings: number; first: Date | null }[]>(
      `select count(distinct r.booking_id)::int as bookings, min(r.starts_at) as first
         from reservation r join booking b on b.id = r.booking_id
        where r.bay_id = ? and r.active and r.ends_at > ?
          and not (b.state = 'held' and b.hold_expires_at is not null and b.hold_expires_at <= ?)`,
      [bay.id, now, now],
    );
    if (!row || row.bookings === 0 || row.first === null) return;
    const first = longDate(localDateOf(new Date(row.first), timeZone));
    const count = row.bookings === 1 ? 'a booking' : `${row.bookings} bookings`;
    const action = switchingOff ? 'switching it off' : 'changing its kind';
    throw new ConflictException(
      `${bay.name} has ${count} from now on (the first on ${first}). Move or cancel ${row.bookings === 1 ? 'it' : 'them'} before ${action}.`,
    );
  }

  private async setupOf(em: EntityManager, workshop: Workshop): Promise<WorkshopSetupResponse> {
    const today = todayLocalDate(workshop.timeZone);
    const lastHolidayDate = addDays(addCalendarMonths(today, HOLIDAY_LIST_MONTHS), -1);
    // One after the other: inside a transaction they share one connection.
    const rows = await em.find(OpeningHours, {});
    const bays = await em.find(Bay, {}, { orderBy: { position: 'asc', name: 'asc' } });
    const closures = await em.find(
      Closure,
      { endDate: { $gte: today } },
      { orderBy: { startDate: 'asc', endDate: 'asc', id: 'asc' } },
    );
    const overrides = await em.find(HolidayOverride, {
      date: { $gte: today, $lte: lastHolidayDate },
    });
    const overrideOn = new Map(overrides.map((override) => [override.date, override]));
    return {
      timeZone: workshop.timeZone,
      holidayRegion: workshop.holidayRegion,
      slotStepMinutes: workshop.slotStepMinutes,
      holdMinutes: workshop.holdMinutes,
      leadTimeBufferDays: workshop.leadTimeBufferDays,
      fittingMinutesPerWheel: workshop.fittingMinutesPerWheel,
      fullRefundHoursBefore: workshop.fullRefundHoursBefore,
      lateCancelRefundPercent: workshop.lateCancelRefundPercent,
      openingHours: openingHoursEntriesOf(rows),
      bays: bays.map((bay) => ({
        id: bay.id,
        name: bay.name,
        kind: bay.kind,
        position: bay.position,
        active: bay.active,
      })),
      closures: closures.map((closure) => ({
        id: closure.id,
        startDate: closure.startDate,
        endDate: closure.endDate,
        reason: closure.reason,
      })),
      holidays: publicHolidays(workshop.holidayRegion, today, lastHolidayDate).map((holiday) => {
        const override = overrideOn.get(holiday.date);
        return {
          date: holiday.date,
          name: holiday.name,
          opens: override !== undefined,
          note: override?.note ?? null,
        };
      }),
      holidayRegions: holidayRegions(),
    };
  }
}
