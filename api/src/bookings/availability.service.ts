import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { QuoteVersion } from '../quotes/entities/quote-version.entity';
import {
  type AvailabilityQuery,
  type BusyInterval,
  findAvailability,
} from '../scheduling/availability';
import { planJob } from '../scheduling/job-plan';
import type { JobPlan } from '../scheduling/scheduling.types';
import { localDateOf } from '../workshop/workshop-time';
import { WorkshopService } from '../workshop/workshop.service';
import {
  type WorkshopCalendarSettings,
  WorkshopSetupService,
} from '../workshop/workshop-setup.service';
import { addLocalDays, startOfLocalDate } from './booking-times';
import { jobPlanInputOf } from './job-plan-input';

/** Days after the window that a job started in it may still run into (the engine's limit). */
const MAX_JOB_DAYS = 5;
/** Calendar days looked past the window for closures and bookings (weekends, holidays). */
const WINDOW_TAIL_DAYS = 14;

/** Whose reservations do not count as busy: the booking being moved, or the quote's own hold. */
export interface BusyExclusion {
  bookingId?: string;
  quoteId?: string;
}

export interface SchedulingContext {
  query: AvailabilityQuery;
  settings: WorkshopCalendarSettings;
  plan: JobPlan;
}

/**
 * Gathers what the scheduling engine needs for one quote version: its job plan, the workshop's
 * calendar (hours, closures, holidays, bays) and the bays' busy times, then asks the engine.
 * Busy: active reservations, except those of holds that have lapsed (whether or not the sweep
 * has reached them yet) and those excluded by the caller.
 */
@Injectable()
export class AvailabilityService {
  constructor(
    private readonly workshop: WorkshopService,
    private readonly setup: WorkshopSetupService,
  ) {}

  async today(): Promise<string> {
    return this.workshop.localDate(new Date());
  }

  async context(
    em: EntityManager,
    version: QuoteVersion,
    window: { fromDate: string; days: number },
    exclusion: BusyExclusion,
    now: Date,
  ): Promise<SchedulingContext> {
    const toDate = addLocalDays(window.fromDate, window.days + WINDOW_TAIL_DAYS);
    const settings = await this.setup.calendarFor(window.fromDate, toDate);
    const today = localDateOf(now, settings.timeZone);
    const plan = planJob(jobPlanInputOf(version, settings, today));
    const busy = await this.busy(
      em,
      startOfLocalDate(addLocalDays(window.fromDate, -1), settings.timeZone),
      startOfLocalDate(toDate, settings.timeZone),
      exclusion,
      now,
    );
    return {
      settings,
      plan,
      query: {
        calendar: {
          timeZone: settings.timeZone,
          weeklyHours: settings.weeklyHours,
          closedDates: settings.closedDates,
          slotStepMinutes: settings.slotStepMinutes,
        },
        plan,
        bays: settings.bays,
        busy,
        fromDate: window.fromDate,
        days: window.days,
        notBeforeMs: now.getTime(),
        maxJobDays: MAX_JOB_DAYS,
      },
    };
  }

  async find(
    em: EntityManager,
    version: QuoteVersion,
    window: { fromDate: string; days: number },
    exclusion: BusyExclusion,
    now = new Date(),
  ) {
    const context = await this.context(em, version, window, exclusion, now);
    return { ...context, days: findAvailability(context.query) };
  }

  private async busy(
    em: EntityManager,
    fromMs: number,
    toMs: number,
    exclusion: BusyExclusion,
    now: Date,
  ): Promise<BusyInterval[]> {
    // em.execute runs inside the caller's transaction when there is one.
    const rows = await em.execute<{ bay_id: string; starts_at: Date; ends_at: Date }[]>(
      `select r.bay_id, r.starts_at, r.ends_at
         from reservation r join booking b on b.id = r.booking_id
        where r.active
          and r.ends_at > ? and r.starts_at < ?
          and not (b.state = 'held' and b.hold_expires_at <= ?)
          and (?::uuid is null or b.id <> ?::uuid)
          and (?::uuid is null or b.state <> 'held' or b.quote_version_id not in
                (select v.id from quote_version v where v.quote_id = ?::uuid))`,
      [
        new Date(fromMs),
        new Date(toMs),
        now,
        exclusion.bookingId ?? null,
        exclusion.bookingId ?? null,
        exclusion.quoteId ?? null,
        exclusion.quoteId ?? null,
      ],
    );
    return rows.map((row) => ({
      bayId: row.bay_id,
      startsAtMs: new Date(row.starts_at).getTime(),
      endsAtMs: new Date(row.ends_at).getTime(),
    }));
  }
}
