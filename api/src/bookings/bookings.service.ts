import { EntityManager } from '@mikro-orm/postgresql';
import {
  ConflictException,
  Injectable,
  NotFoundException,
  type OnModuleInit,
} from '@nestjs/common';
import { FieldErrorsException } from '../common/errors/field-errors.exception';
import { TimeTakenException } from '../common/errors/time-taken.exception';
import { vehicleName } from '../fit-reports/fit-reports.service';
import { paymentSummary } from '../payments/payment-summary';
import {
  bookingCancelledMessage,
  bookingMovedMessage,
  refundIssuedMessage,
} from '../notifications/messages/booking-messages';
import { amount, workshopDateTime } from '../notifications/messages/customer-message';
import { NotificationsService } from '../notifications/notifications.service';
import { PaymentsService } from '../payments/payments.service';
import { QuoteVersion } from '../quotes/entities/quote-version.entity';
import { QuoteHooks, type QuoteAnsweredEvent, type QuoteRevisedEvent } from '../quotes/quote-hooks';
import { effectiveState } from '../quotes/quote-lifecycle';
import { quoteReference } from '../quotes/quote-reference';
import { QuotesService } from '../quotes/quotes.service';
import { type StartOption, startOptionAt } from '../scheduling/availability';
import type { User } from '../users/entities/user.entity';
import { Bay } from '../workshop/entities/bay.entity';
import { type WorkshopSettings, WorkshopService, loadWorkshop } from '../workshop/workshop.service';
import { AvailabilityService, type BusyExclusion } from './availability.service';
import type { BookingEventKind } from './booking-event-kinds';
import { bayTimeInWords, recordBookingEvent, sameBayTime } from './booking-events';
import { type BookingState, bookingReference } from './booking-states';
import { isCalendarDate, startOptionResponse, utcIso, zonedIso } from './booking-times';
import type {
  AdvanceBookingDto,
  AvailabilityQueryDto,
  CreateBookingDto,
  MoveBookingDto,
  MoveRequestDto,
} from './dto/booking-requests.dto';
import type { AvailabilityResponse, StartOptionResponse } from './dto/availability.response';
import type {
  BookingListResponse,
  BookingResponse,
  DepositCheckoutResponse,
} from './dto/booking.response';
import { Booking } from './entities/booking.entity';
import { Reservation } from './entities/reservation.entity';
import { expireLapsedHolds, isOverlapRefusal } from './holds';

/** The state each desk step starts from. */
const BOOKING_STEPS: Record<AdvanceBookingDto['state'], BookingState> = {
  confirmed: 'requested',
  'in-progress': 'confirmed',
  completed: 'in-progress',
};

/** Each desk step's line in the audit trail. */
const STEP_EVENTS: Record<AdvanceBookingDto['state'], [BookingEventKind, string]> = {
  confirmed: ['confirmed', 'Confirmed by the workshop.'],
  'in-progress': ['started', 'Work started.'],
  completed: ['completed', 'Work completed.'],
};

/** States whose booking follows its quote to an accepted revision. */
const REPLANNED_STATES: readonly BookingState[] = ['held', 'requested', 'confirmed'];

/** Roles that see and manage every booking. */
const DESK_ROLES = ['desk', 'manager'] as const;
/** Tries of a hold or move whose bay was taken by a concurrent request: then another bay is tried. */
const ATTEMPTS = 3;
/** Alternatives offered with a 409. */
const NEXT_STARTS = 5;
const DEFAULT_DAYS = 14;

const TAKEN_MESSAGE = 'That time has just been taken or is no longer offered. Pick another time.';

function seesEveryBooking(user: User): boolean {
  return (DESK_ROLES as readonly string[]).includes(user.role);
}

const POPULATE = [
  'customer',
  'reservations',
  'reservations.bay',
  'quoteVersion',
  'quoteVersion.quote',
  'quoteVersion.quote.vehicleModel',
  'quoteVersion.quote.customerVehicle',
  'quoteVersion.quote.versions',
  'payments',
  'events',
  'events.actor',
] as const;

/**
 * Holds, moves and cancellations of bay time. Every change of reservations happens in one
 * transaction; the database's exclusion constraint is the final word on overlaps, so a race
 * between two requests for one bay ends with one of them refused (409), never both held.
 */
@Injectable()
export class BookingsService implements OnModuleInit {
  constructor(
    private readonly em: EntityManager,
    private readonly quotes: QuotesService,
    private readonly availability: AvailabilityService,
    private readonly workshop: WorkshopService,
    private readonly payments: PaymentsService,
    private readonly notifications: NotificationsService,
    private readonly quoteHooks: QuoteHooks,
  ) {}

  /** An accepted revision of a booked quote re-plans the booking, in the accepting transaction. */
  onModuleInit(): void {
    this.quoteHooks.onAccepted((event) => this.replanOnAcceptance(event));
    this.quoteHooks.onRevised((event) => this.noteRevision(event));
    this.quoteHooks.onDeclined((event) => this.noteDeclined(event));
  }

  async findAvailability(query: AvailabilityQueryDto, user: User): Promise<AvailabilityResponse> {
    const fromDate = query.from ?? (await this.availability.today());
    if (!isCalendarDate(fromDate)) {
      throw new FieldErrorsException({ from: ['is not a calendar date'] });
    }
    const version = await this.quotes.assertBookable(query.quoteVersionId, user);
    const found = await this.availability.find(
      this.em,
      version,
      { fromDate, days: query.days ?? DEFAULT_DAYS },
      { quoteId: version.quote.id },
    );
    const timeZone = found.settings.timeZone;
    return {
      quoteVersionId: version.id,
      timeZone,
      holdMinutes: found.settings.holdMinutes,
      plan: found.plan,
      days: found.days.map((day) => ({
        date: day.date,
        closedReason: day.closedReason,
        starts: day.starts.map((option) => startOptionResponse(option, timeZone)),
      })),
    };
  }

  /** Holds the time for the customer of the quote; an earlier live hold of the quote is released. */
  async hold(dto: CreateBookingDto, user: User): Promise<BookingResponse> {
    const startMs = Date.parse(dto.start);
    const version = await this.quotes.assertBookable(dto.quoteVersionId, user);
    const id = await this.withRetries(version, startMs, { quoteId: version.quote.id }, (em, now) =>
      this.holdOnce(em, version.id, startMs, user, now),
    );
    return this.get(id, user);
  }

  async move(id: string, dto: MoveBookingDto, user: User): Promise<BookingResponse> {
    const startMs = Date.parse(dto.start);
    const booking = await this.loadVisible(this.em, id, user);
    this.assertMovable(booking, user);
    if (booking.state === 'held') await this.quotes.assertBookable(booking.quoteVersion.id, user);
    await this.withRetries(booking.quoteVersion, startMs, { bookingId: booking.id }, (em, now) =>
      this.moveOnce(em, booking.id, startMs, user, now),
    );
    return this.get(booking.id, user);
  }

  async cancel(id: string, user: User): Promise<BookingResponse> {
    await this.em.transactional(async (em) => {
      await expireLapsedHolds(em, new Date());
      const booking = await this.lockVisible(em, id, user);
      const allowed: BookingState[] = seesEveryBooking(user)
        ? ['held', 'requested', 'confirmed', 'in-progress']
        : ['held', 'requested', 'confirmed'];
      if (!allowed.includes(booking.state)) {
        throw new ConflictException(
          `Booking ${bookingReference(booking.number)} is ${booking.state} and cannot be cancelled.`,
        );
      }
      // The refund the policy allows is made first: if the provider fails, nothing is cancelled.
      const now = new Date();
      const workshop = await loadWorkshop(em);
      const refunds = await this.payments.refundOnCancellation(em, booking, workshop, now);
      const wasState = booking.state;
      booking.state = 'cancelled';
      booking.stateChangedAt = now;
      booking.cancelledAt = booking.stateChangedAt;
      booking.holdExpiresAt = null;
      for (const reservation of booking.reservations) reservation.active = false;
      recordBookingEvent(em, booking, 'cancelled', cancelledDetail(wasState, refunds), user, now);
      await this.queueCancelled(em, booking, wasState, refunds, now);
    });
    return this.get(id, user);
  }

  /**
   * The customer is told of a cancellation (not of a hold let go: they are choosing a time),
   * with a METHOD:CANCEL event when they had a confirmed one, and of each refund.
   */
  private async queueCancelled(
    em: EntityManager,
    booking: Booking,
    wasState: BookingState,
    refunds: Awaited<ReturnType<PaymentsService['refundOnCancellation']>>,
    now: Date,
  ): Promise<void> {
    if (wasState === 'held' && refunds.length === 0) return;
    booking.calendarSequence += 1;
    const input = await this.notifications.bookingInput(em, booking, now);
    await this.notifications.queue(em, {
      causeKey: `booking-cancelled:${booking.id}`,
      to: booking.customer.email,
      content: bookingCancelledMessage({
        ...input,
        withCalendar: wasState === 'confirmed' || wasState === 'in-progress',
      }),
    });
    for (const refund of refunds) {
      await this.notifications.queue(em, {
        causeKey: `refund-issued:${refund.id}`,
        to: booking.customer.email,
        content: refundIssuedMessage({
          customer: input.customer,
          workshop: input.workshop,
          timeZone: input.timeZone,
          bookingReference: input.bookingReference,
          currency: refund.payment.currency,
          refundCents: refund.amountCents,
          paidCents: refund.payment.amountCents,
          reason: refund.reason,
          refundedAt: now,
        }),
      });
    }
  }

  /**
   * The payment page for the deposit of a held booking (the open one again, or a new one); the
   * hold lasts at least as long as the page takes payment.
   */
  async depositCheckout(id: string, user: User): Promise<DepositCheckoutResponse> {
    const checkout = await this.em.fork().transactional(async (em) => {
      const now = new Date();
      await expireLapsedHolds(em, now);
      const booking = await this.lockVisible(em, id, user);
      return this.payments.depositCheckout(em, booking, await loadWorkshop(em), now);
    });
    return {
      checkoutUrl: checkout.checkoutUrl,
      expiresAt: utcIso(checkout.expiresAt.getTime()),
      booking: await this.get(id, user),
    };
  }

  /**
   * The payment page for the difference when the booking's (revised) quote asks a higher deposit
   * than was paid: while requested or confirmed; 409 when nothing is due.
   */
  async topUpCheckout(id: string, user: User): Promise<DepositCheckoutResponse> {
    const checkout = await this.em.fork().transactional(async (em) => {
      const booking = await this.lockVisible(em, id, user);
      return this.payments.topUpCheckout(em, booking, await loadWorkshop(em), new Date());
    });
    return {
      checkoutUrl: checkout.checkoutUrl,
      expiresAt: utcIso(checkout.expiresAt.getTime()),
      booking: await this.get(id, user),
    };
  }

  async requestMove(id: string, dto: MoveRequestDto, user: User): Promise<BookingResponse> {
    await this.em.transactional(async (em) => {
      const booking = await this.lockVisible(em, id, user);
      if (booking.customer.id !== user.id) throw new NotFoundException('No booking has this id');
      if (booking.state !== 'requested' && booking.state !== 'confirmed') {
        throw new ConflictException(
          booking.state === 'held'
            ? 'A held time can be changed directly: pick another time.'
            : `Booking ${bookingReference(booking.number)} is ${booking.state}: it cannot be moved.`,
        );
      }
      booking.moveRequestNote = dto.note.trim();
      booking.moveRequestedAt = new Date();
      recordBookingEvent(
        em,
        booking,
        'move-requested',
        `The customer asked to move it: “${booking.moveRequestNote}”`,
        user,
        booking.moveRequestedAt,
      );
    });
    return this.get(id, user);
  }

  /**
   * The desk moves a booking along its work: requested → confirmed (the workshop takes it on),
   * confirmed → in-progress (the vehicle is in and work has started), in-progress → completed.
   */
  async advance(id: string, dto: AdvanceBookingDto, user: User): Promise<BookingResponse> {
    await this.em.transactional(async (em) => {
      const booking = await this.lockVisible(em, id, user);
      const from = BOOKING_STEPS[dto.state];
      if (booking.state !== from) {
        throw new ConflictException(
          `Booking ${bookingReference(booking.number)} is ${booking.state}: only a ${from} booking can become ${dto.state}.`,
        );
      }
      booking.state = dto.state;
      booking.stateChangedAt = new Date();
      if (dto.state === 'in-progress' && !booking.arrivedAt) {
        booking.arrivedAt = booking.stateChangedAt;
      }
      const [kind, detail] = STEP_EVENTS[dto.state];
      recordBookingEvent(em, booking, kind, detail, user, booking.stateChangedAt);
      // The customer hears of it (with the calendar entry) in the same transaction.
      if (dto.state === 'confirmed') {
        await this.notifications.queueBookingConfirmed(em, booking, booking.stateChangedAt);
      }
    });
    return this.get(id, user);
  }

  /**
   * The desk marks the vehicle as arrived (on site, keys in) on a requested or confirmed booking;
   * once only. Starting work without it records the arrival at the same moment.
   */
  async markArrived(id: string, user: User): Promise<BookingResponse> {
    await this.em.transactional(async (em) => {
      const booking = await this.lockVisible(em, id, user);
      const reference = bookingReference(booking.number);
      if (booking.arrivedAt) {
        throw new ConflictException(`The vehicle for booking ${reference} is already marked in.`);
      }
      if (booking.state !== 'requested' && booking.state !== 'confirmed') {
        throw new ConflictException(
          `Booking ${reference} is ${booking.state}: a vehicle is marked in on a requested or confirmed booking.`,
        );
      }
      booking.arrivedAt = new Date();
      recordBookingEvent(em, booking, 'arrived', 'The vehicle arrived.', user, booking.arrivedAt);
    });
    return this.get(id, user);
  }

  async list(user: User): Promise<BookingListResponse> {
    await expireLapsedHolds(this.em, new Date());
    const settings = await this.workshop.settings();
    const bookings = await this.em
      .fork()
      .find(Booking, seesEveryBooking(user) ? {} : { customer: user.id }, {
        populate: POPULATE,
        orderBy: { createdAt: 'desc', number: 'desc' },
      });
    const now = Date.now();
    return { items: bookings.map((booking) => this.toResponse(booking, settings, now)) };
  }

  async get(id: string, user: User): Promise<BookingResponse> {
    await expireLapsedHolds(this.em, new Date());
    const settings = await this.workshop.settings();
    const booking = await this.loadVisible(this.em.fork(), id, user);
    return this.toResponse(booking, settings, Date.now());
  }

  // ---- inside a transaction ---------------------------------------------------------------

  /**
   * A revised version of a booked quote was accepted (inside the accepting transaction, `em`).
   * The quote's active booking on an earlier version follows it: relinked, and re-planned from
   * the new version's lines. Same bay time: only the link changes. Other bay time that fits at
   * the same start (the same availability rules, any suitable bays): the reservations are
   * replaced here, with the bays locked (the exclusion constraint still guards), and when the
   * times changed the customer is told as of a move. Not fitting: the old reservations stay and
   * the desk is asked to move it (`needsMove`).
   */
  /** A revised quote was sent: the booking waiting on it says so in its trail. */
  async noteRevision({
    em,
    quote,
    version,
    previous,
    actor,
    now,
  }: QuoteRevisedEvent): Promise<void> {
    const booking = await this.bookingBefore(em, quote.id, version.number, now);
    if (!booking) return;
    const reference = quoteReference(quote.number);
    recordBookingEvent(
      em,
      booking,
      'revision-sent',
      `Revised quote ${reference} v${version.number} sent to the customer (it replaces v${previous.number}): “${version.revisionReason ?? ''}”. The booking stays on v${booking.quoteVersion.number} until the customer accepts it.`,
      actor,
      now,
    );
  }

  /** The customer declined a revision: the booking stays on the version it was booked on. */
  async noteDeclined({ em, quote, version, actor, now }: QuoteAnsweredEvent): Promise<void> {
    const booking = await this.bookingBefore(em, quote.id, version.number, now);
    if (!booking) return;
    recordBookingEvent(
      em,
      booking,
      'revision-declined',
      `The customer declined quote ${quoteReference(quote.number)} v${version.number}; the booking stays on v${booking.quoteVersion.number}.`,
      actor,
      now,
    );
  }

  /** The quote's live booking on a version before `versionNumber`, locked; null when none. */
  private async bookingBefore(
    em: EntityManager,
    quoteId: string,
    versionNumber: number,
    now: Date,
  ): Promise<Booking | null> {
    const [row] = await em.execute<{ id: string }[]>(
      `select b.id from booking b join quote_version v on v.id = b.quote_version_id
        where v.quote_id = ? and v.number < ? and b.state in (?, ?, ?)
          and not (b.state = 'held' and b.hold_expires_at <= ?)
        order by b.created_at desc limit 1
        for update of b`,
      [quoteId, versionNumber, ...REPLANNED_STATES, now],
    );
    return row ? em.findOneOrFail(Booking, row.id, { populate: POPULATE }) : null;
  }

  async replanOnAcceptance({ em, quote, version, actor, now }: QuoteAnsweredEvent): Promise<void> {
    const booking = await this.bookingBefore(em, quote.id, version.number, now);
    if (!booking) return;
    const accepted = await em.findOneOrFail(QuoteVersion, version.id, {
      populate: ['quote', 'quote.vehicleModel', 'quote.customerVehicle', 'quote.versions'] as const,
    });
    const timeZone = (await this.workshop.settings()).timeZone;
    const label = `quote ${quoteReference(accepted.quote.number)} v${accepted.number}`;
    const oldPlan = booking.plan;
    booking.quoteVersion = accepted;
    const context = await this.availability.context(
      em,
      accepted,
      { fromDate: await this.workshop.localDate(booking.startsAt), days: 1 },
      { bookingId: booking.id },
      now,
    );
    const newPlan = context.plan;

    if (sameBayTime(oldPlan, newPlan)) {
      // The reservations are of the old plan: the same bay time, so they stand (and fit).
      booking.plan = newPlan;
      booking.needsMoveReason = null;
      booking.needsMoveSince = null;
      recordBookingEvent(
        em,
        booking,
        're-planned',
        `Now for ${label} (the revised quote was accepted). The job takes the same bay time (${bayTimeInWords(newPlan)}), so its time stays.`,
        actor,
        now,
      );
      await em.flush();
      return;
    }

    // Other bay time: the bays are locked first (a hold in flight finishes, a new one waits for
    // this transaction), then their busy times read again, so the time found here is still free
    // when it is written and the acceptance is never refused by the exclusion constraint.
    await em.execute('select id from bay where active order by id for update');
    const fresh = await this.availability.context(
      em,
      accepted,
      { fromDate: await this.workshop.localDate(booking.startsAt), days: 1 },
      { bookingId: booking.id },
      now,
    );
    const option =
      newPlan.segments.length > 0 ? startOptionAt(fresh.query, booking.startsAt.getTime()) : null;
    if (!option) {
      booking.needsMoveReason = `The revised quote (${label}) needs ${bayTimeInWords(newPlan)} instead of ${bayTimeInWords(oldPlan)}, which no longer fits at ${workshopDateTime(booking.startsAt, timeZone)}. Move the booking to a time that fits.`;
      booking.needsMoveSince = now;
      recordBookingEvent(
        em,
        booking,
        're-planned',
        `Now for ${label} (the revised quote was accepted). Its bay time changed from ${bayTimeInWords(oldPlan)} to ${bayTimeInWords(newPlan)}; the booked time was kept.`,
        actor,
        now,
      );
      recordBookingEvent(em, booking, 'needs-move', booking.needsMoveReason, null, now);
      await em.flush();
      return;
    }

    const previousStartsAt = booking.startsAt;
    const previousEndsAt = booking.endsAt;
    for (const reservation of booking.reservations) em.remove(reservation);
    await em.flush();
    booking.startsAt = new Date(option.startsAtMs);
    booking.endsAt = new Date(option.endsAtMs);
    booking.plan = newPlan;
    booking.needsMoveReason = null;
    booking.needsMoveSince = null;
    await this.reserve(em, booking, option);
    const timesChanged =
      booking.startsAt.getTime() !== previousStartsAt.getTime() ||
      booking.endsAt.getTime() !== previousEndsAt.getTime();
    recordBookingEvent(
      em,
      booking,
      're-planned',
      `Re-planned for ${label} (the revised quote was accepted): bay time ${bayTimeInWords(oldPlan)} → ${bayTimeInWords(newPlan)}; ${
        timesChanged
          ? `it now runs ${workshopDateTime(booking.startsAt, timeZone)} to ${workshopDateTime(booking.endsAt, timeZone)} (was to ${workshopDateTime(previousEndsAt, timeZone)})`
          : 'the start and finish are unchanged'
      }.`,
      actor,
      now,
    );
    if (timesChanged && booking.state !== 'held') {
      booking.calendarSequence += 1;
      await this.notifications.queue(em, {
        causeKey: `booking-moved:${booking.id}:${booking.calendarSequence}`,
        to: booking.customer.email,
        content: bookingMovedMessage({
          ...(await this.notifications.bookingInput(em, booking, now)),
          previousStartsAt,
          withCalendar: booking.state === 'confirmed',
        }),
      });
    }
    await em.flush();
  }

  private async holdOnce(
    em: EntityManager,
    versionId: string,
    startMs: number,
    user: User,
    now: Date,
  ): Promise<string> {
    await expireLapsedHolds(em, now);
    const version = await em.findOneOrFail(QuoteVersion, versionId, {
      populate: ['quote', 'quote.customer'],
    });
    // One live hold per quote: picking a new time lets go of the one picked before.
    const earlier = await em.find(
      Booking,
      { state: 'held', quoteVersion: { quote: version.quote.id } },
      { populate: ['reservations'] },
    );
    for (const booking of earlier) {
      booking.state = 'cancelled';
      booking.stateChangedAt = now;
      booking.cancelledAt = now;
      booking.holdExpiresAt = null;
      for (const reservation of booking.reservations) reservation.active = false;
      recordBookingEvent(
        em,
        booking,
        'cancelled',
        'Hold released: another time was picked for the same quote.',
        user,
        now,
      );
    }
    await em.flush();

    const { option, settings, plan } = await this.optionAt(em, version, startMs, {}, now);
    const booking = new Booking({
      customer: version.quote.customer,
      quoteVersion: version,
      createdBy: user,
      state: 'held',
      startsAt: new Date(option.startsAtMs),
      endsAt: new Date(option.endsAtMs),
      holdExpiresAt: new Date(now.getTime() + settings.holdMinutes * 60_000),
      plan,
    });
    em.persist(booking);
    await this.reserve(em, booking, option);
    recordBookingEvent(
      em,
      booking,
      'held',
      `Held for ${workshopDateTime(booking.startsAt, settings.timeZone)} (quote ${quoteReference(version.quote.number)} v${version.number}) until ${workshopDateTime(booking.holdExpiresAt!, settings.timeZone)}.`,
      user,
      now,
    );
    await em.flush();
    return booking.id;
  }

  private async moveOnce(
    em: EntityManager,
    id: string,
    startMs: number,
    user: User,
    now: Date,
  ): Promise<string> {
    await expireLapsedHolds(em, now);
    const booking = await this.lockVisible(em, id, user);
    this.assertMovable(booking, user);
    const previousStartsAt = booking.startsAt;
    // Release first, in this transaction: the booking's own time does not stand in its way, and
    // if the new time is refused everything rolls back to where it was.
    for (const reservation of booking.reservations) em.remove(reservation);
    await em.flush();
    const { option, settings, plan } = await this.optionAt(
      em,
      booking.quoteVersion,
      startMs,
      {},
      now,
    );
    booking.startsAt = new Date(option.startsAtMs);
    booking.endsAt = new Date(option.endsAtMs);
    booking.plan = plan;
    if (booking.state === 'held') {
      // The countdown restarts, but never ends before an open payment page of the booking does.
      const pageOpenUntil = booking.payments
        .getItems()
        .filter((payment) => payment.status === 'open' && payment.expiresAt > now)
        .reduce((latest, payment) => Math.max(latest, payment.expiresAt.getTime()), 0);
      booking.holdExpiresAt = new Date(
        Math.max(now.getTime() + settings.holdMinutes * 60_000, pageOpenUntil),
      );
    }
    await this.reserve(em, booking, option);
    const hadToMove = booking.needsMoveReason !== null;
    booking.needsMoveReason = null;
    booking.needsMoveSince = null;
    recordBookingEvent(
      em,
      booking,
      'moved',
      `Moved from ${workshopDateTime(previousStartsAt, settings.timeZone)} to ${workshopDateTime(booking.startsAt, settings.timeZone)}${hadToMove ? ', to fit the revised quote' : ''}.`,
      user,
      now,
    );
    if (booking.state !== 'held') {
      // A held time is the customer's own choice; a requested or confirmed one is told.
      booking.calendarSequence += 1;
      await this.notifications.queue(em, {
        causeKey: `booking-moved:${booking.id}:${booking.calendarSequence}`,
        to: booking.customer.email,
        content: bookingMovedMessage({
          ...(await this.notifications.bookingInput(em, booking, now)),
          previousStartsAt,
          withCalendar: booking.state === 'confirmed',
        }),
      });
    }
    await em.flush();
    return booking.id;
  }

  /**
   * Takes the option's bays: first it locks them against being switched off meanwhile (Manage →
   * Workshop locks a bay for update before it checks for reservations), then adds a reservation
   * per segment. A bay switched off since the availability was read makes the time taken.
   */
  private async reserve(em: EntityManager, booking: Booking, option: StartOption): Promise<void> {
    const bayIds = [...new Set(option.segments.map((segment) => segment.bayId))];
    const open = await em.execute<{ id: string }[]>(
      `select id from bay where id in (${bayIds.map(() => '?').join(', ')}) and active for share`,
      bayIds,
    );
    if (open.length !== bayIds.length) throw new TimeTakenException(TAKEN_MESSAGE, []);
    for (const segment of option.segments) {
      em.persist(
        new Reservation({
          booking,
          bay: em.getReference(Bay, segment.bayId),
          startsAt: new Date(segment.startsAtMs),
          endsAt: new Date(segment.endsAtMs),
        }),
      );
    }
  }

  /** The offered option at exactly that start, or a 409 with the next ones. */
  private async optionAt(
    em: EntityManager,
    version: QuoteVersion,
    startMs: number,
    exclusion: BusyExclusion,
    now: Date,
  ) {
    const timeZone = (await this.workshop.settings()).timeZone;
    const fromDate = await this.workshop.localDate(new Date(startMs));
    const context = await this.availability.context(
      em,
      version,
      { fromDate, days: 1 },
      exclusion,
      now,
    );
    if (context.plan.segments.length === 0) {
      throw new ConflictException('This quote has no workshop time to book.');
    }
    const option = startOptionAt(context.query, startMs);
    if (!option) {
      throw new TimeTakenException(
        TAKEN_MESSAGE,
        await this.nextStarts(em, version, startMs, exclusion, now, timeZone),
      );
    }
    return { option, settings: context.settings, plan: context.plan };
  }

  private async nextStarts(
    em: EntityManager,
    version: QuoteVersion,
    startMs: number,
    exclusion: BusyExclusion,
    now: Date,
    timeZone: string,
  ): Promise<StartOptionResponse[]> {
    const fromDate = await this.workshop.localDate(new Date(Math.max(startMs, now.getTime())));
    const found = await this.availability.find(
      em,
      version,
      { fromDate, days: DEFAULT_DAYS },
      exclusion,
      now,
    );
    return found.days
      .flatMap((day) => day.starts)
      .filter((option) => option.startsAtMs > startMs)
      .slice(0, NEXT_STARTS)
      .map((option) => startOptionResponse(option, timeZone));
  }

  /**
   * Runs a hold or move in its own transaction. A refusal by the exclusion constraint means a
   * concurrent request took the bay between our read and our write: the transaction is rolled
   * back and tried again (another bay of the kind may be free); after the last try it is a 409.
   */
  private async withRetries(
    version: QuoteVersion,
    startMs: number,
    exclusion: BusyExclusion,
    attempt: (em: EntityManager, now: Date) => Promise<string>,
  ): Promise<string> {
    for (let tries = 1; ; tries += 1) {
      try {
        return await this.em.fork().transactional((em) => attempt(em, new Date()));
      } catch (error) {
        if (!isOverlapRefusal(error)) throw error;
        if (tries >= ATTEMPTS) {
          const now = new Date();
          const timeZone = (await this.workshop.settings()).timeZone;
          throw new TimeTakenException(
            TAKEN_MESSAGE,
            await this.nextStarts(this.em.fork(), version, startMs, exclusion, now, timeZone),
          );
        }
      }
    }
  }

  private assertMovable(booking: Booking, user: User): void {
    const allowed: BookingState[] = seesEveryBooking(user)
      ? ['held', 'requested', 'confirmed']
      : ['held'];
    if (allowed.includes(booking.state)) return;
    throw new ConflictException(
      seesEveryBooking(user) || (booking.state !== 'requested' && booking.state !== 'confirmed')
        ? `Booking ${bookingReference(booking.number)} is ${booking.state} and cannot be moved.`
        : 'Ask the workshop to move this booking.',
    );
  }

  private async loadVisible(em: EntityManager, id: string, user: User): Promise<Booking> {
    const booking = await em.findOne(
      Booking,
      seesEveryBooking(user) ? { id } : { id, customer: user.id },
      { populate: POPULATE },
    );
    if (!booking) throw new NotFoundException('No booking has this id');
    return booking;
  }

  /** The booking, locked for this transaction (a concurrent change waits), or a 404. */
  private async lockVisible(em: EntityManager, id: string, user: User): Promise<Booking> {
    await em.execute('select id from booking where id = ? for update', [id]);
    return this.loadVisible(em, id, user);
  }

  private toResponse(booking: Booking, settings: WorkshopSettings, nowMs: number): BookingResponse {
    const timeZone = settings.timeZone;
    const version = booking.quoteVersion;
    const quote = version.quote;
    const reservations = booking.reservations.getItems();
    const latest = quote.versions
      .getItems()
      .reduce((highest, candidate) => (candidate.number > highest.number ? candidate : highest));
    const money = paymentSummary({
      state: booking.state,
      startsAtMs: booking.startsAt.getTime(),
      totalCents: version.totalCents,
      depositCents: version.depositCents,
      payments: booking.payments.getItems(),
      policy: settings.cancellationPolicy,
      nowMs,
    });
    return {
      id: booking.id,
      reference: bookingReference(booking.number),
      state: booking.state,
      holdExpiresAt:
        booking.state === 'held' && booking.holdExpiresAt
          ? utcIso(booking.holdExpiresAt.getTime())
          : null,
      start: zonedIso(booking.startsAt.getTime(), timeZone),
      startUtc: utcIso(booking.startsAt.getTime()),
      end: zonedIso(booking.endsAt.getTime(), timeZone),
      endUtc: utcIso(booking.endsAt.getTime()),
      timeZone,
      segments: reservations.map((reservation, index) => ({
        bayId: reservation.bay.id,
        bayName: reservation.bay.name,
        bayKind: reservation.bay.kind,
        minutes: booking.plan.segments[index]?.minutes ?? 0,
        work: [...(booking.plan.segments[index]?.descriptions ?? [])],
        start: zonedIso(reservation.startsAt.getTime(), timeZone),
        startUtc: utcIso(reservation.startsAt.getTime()),
        end: zonedIso(reservation.endsAt.getTime(), timeZone),
        endUtc: utcIso(reservation.endsAt.getTime()),
      })),
      quote: {
        id: quote.id,
        reference: quoteReference(quote.number),
        versionId: version.id,
        versionNumber: version.number,
        totalCents: version.totalCents,
        depositCents: version.depositCents,
        vehicleName: vehicleName(quote.vehicleModel),
        packageSummary: [
          ...new Set(booking.plan.segments.flatMap((segment) => segment.descriptions)),
        ].join(' · '),
        latestVersionNumber: latest.number,
        latestVersionState: effectiveState(latest, new Date(nowMs)),
      },
      customer: {
        id: booking.customer.id,
        name: booking.customer.name,
        email: booking.customer.email,
      },
      rego: quote.customerVehicle?.rego ?? null,
      needsMove:
        booking.needsMoveReason && booking.needsMoveSince
          ? { reason: booking.needsMoveReason, since: utcIso(booking.needsMoveSince.getTime()) }
          : null,
      events: booking.events.getItems().map((event) => ({
        at: utcIso(event.at.getTime()),
        kind: event.kind,
        actor: event.actor ? { name: event.actor.name, role: event.actor.role } : null,
        detail: event.detail,
      })),
      moveRequest:
        booking.moveRequestNote && booking.moveRequestedAt
          ? {
              note: booking.moveRequestNote,
              requestedAt: utcIso(booking.moveRequestedAt.getTime()),
            }
          : null,
      arrivedAt: booking.arrivedAt ? utcIso(booking.arrivedAt.getTime()) : null,
      ...money,
      createdAt: utcIso(booking.createdAt.getTime()),
    };
  }
}

/** The cancellation's line in the audit trail: what was given back. */
function cancelledDetail(
  wasState: BookingState,
  refunds: { amountCents: number; payment: { currency: string } }[],
): string {
  if (wasState === 'held' && refunds.length === 0) return 'Hold released.';
  if (refunds.length === 0) return 'Cancelled; nothing refunded under the cancellation policy.';
  const total = refunds.reduce((sum, refund) => sum + refund.amountCents, 0);
  return `Cancelled; ${amount(total, refunds[0].payment.currency)} refunded under the cancellation policy.`;
}
