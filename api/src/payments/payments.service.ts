import { randomUUID } from 'node:crypto';
import { EntityManager } from '@mikro-orm/postgresql';
import { BadGatewayException, ConflictException, Inject, Injectable, Logger } from '@nestjs/common';
import type Stripe from 'stripe';
import { bookingReference } from '../bookings/booking-states';
import type { Booking } from '../bookings/entities/booking.entity';
import { AppConfigService } from '../config/app-config.service';
import { type CancellationPolicy, cancellationRefund } from '../pricing/cancellation-refund';
import { quoteReference } from '../quotes/quote-reference';
import type { Workshop } from '../workshop/entities/workshop.entity';
import { Payment } from './entities/payment.entity';
import { Refund } from './entities/refund.entity';
import type { PaymentKind } from './payment-states';
import { TOP_UP_STATES, heldCents, topUpDueCents } from './payment-summary';
import { PAYMENTS_CLIENT, type PaymentsClient } from './payments-client';
import { isIdempotencyConflict, providerFailure } from './provider-errors';

/** The provider's shortest checkout session: 30 minutes. */
const CHECKOUT_MINUTES = 30;
/**
 * The provider counts the 30 minutes from the moment it creates the session, a little after we
 * ask (and later still when the SDK has to send the request again): a minute's margin.
 */
const CHECKOUT_MARGIN_SECONDS = 60;
/** New attempt numbers tried when an idempotency key was already used with other parameters. */
const ATTEMPT_TRIES = 3;

export interface DepositCheckout {
  checkoutUrl: string;
  expiresAt: Date;
}

/** A payment's reference for the provider's metadata and our messages. */
function paymentDescription(booking: Booking, kind: PaymentKind): string {
  const version = booking.quoteVersion;
  const what = kind === 'top-up' ? 'Deposit top-up' : 'Deposit';
  return `${what} for booking ${bookingReference(booking.number)} (quote ${quoteReference(version.quote.number)} v${version.number})`;
}

/**
 * The deposit's checkout sessions and the refunds of paid payments, at the payment provider.
 * Each method runs inside the caller's transaction, with the booking row locked, so that two
 * requests for one booking (or a request and a webhook) happen one after the other.
 */
@Injectable()
export class PaymentsService {
  private readonly logger = new Logger(PaymentsService.name);

  constructor(
    @Inject(PAYMENTS_CLIENT) private readonly client: PaymentsClient,
    private readonly config: AppConfigService,
  ) {}

  /**
   * The checkout session for the booking's deposit: the open one when there is one (the same
   * address again), otherwise a new one, its payment recorded `open`. The hold is kept at least
   * until the session expires. The booking must be held, its hold alive, its deposit unpaid
   * (populated with customer, quote version and quote, and payments).
   */
  async depositCheckout(
    em: EntityManager,
    booking: Booking,
    workshop: Workshop,
    now: Date,
  ): Promise<DepositCheckout> {
    const reference = bookingReference(booking.number);
    const payments = booking.payments.getItems();
    if (payments.some((payment) => payment.kind === 'deposit' && payment.status === 'paid')) {
      throw new ConflictException(`The deposit for booking ${reference} is already paid.`);
    }
    if (booking.state === 'expired') {
      throw new ConflictException(
        `The time held for booking ${reference} has run out. Pick a time again to pay the deposit.`,
      );
    }
    if (booking.state !== 'held' || !booking.holdExpiresAt || booking.holdExpiresAt <= now) {
      throw new ConflictException(
        `Booking ${reference} is ${booking.state}: a deposit is paid only while its time is held.`,
      );
    }
    const depositCents = booking.quoteVersion.depositCents;
    if (depositCents <= 0) {
      throw new ConflictException(`Booking ${reference} needs no deposit.`);
    }

    for (const payment of payments) {
      if (payment.status === 'open' && payment.expiresAt <= now) payment.status = 'expired';
    }
    const page = await this.openOrNewSession(em, booking, workshop, now, {
      kind: 'deposit',
      amountCents: depositCents,
      action: 'start the deposit payment',
    });
    this.keepHoldUntil(booking, page.expiresAt);
    return page;
  }

  /**
   * The checkout session for the difference when the booking's quote version asks a higher
   * deposit than its payments hold (an accepted revision): the open one for that amount when
   * there is one, otherwise a new one (payment kind `top-up`, the same idempotency-key pattern
   * as the deposit). Only while requested or confirmed; 409 when nothing is due.
   */
  async topUpCheckout(
    em: EntityManager,
    booking: Booking,
    workshop: Workshop,
    now: Date,
  ): Promise<DepositCheckout> {
    const reference = bookingReference(booking.number);
    if (!TOP_UP_STATES.includes(booking.state)) {
      throw new ConflictException(
        `Booking ${reference} is ${booking.state}: a deposit top-up is paid only while it is requested or confirmed.`,
      );
    }
    const payments = booking.payments.getItems();
    for (const payment of payments) {
      if (payment.status === 'open' && payment.expiresAt <= now) payment.status = 'expired';
    }
    const dueCents = topUpDueCents({
      state: booking.state,
      depositCents: booking.quoteVersion.depositCents,
      payments,
    });
    if (dueCents <= 0) {
      throw new ConflictException(
        `Nothing is due: the deposit for booking ${reference} is paid in full.`,
      );
    }
    return this.openOrNewSession(em, booking, workshop, now, {
      kind: 'top-up',
      amountCents: dueCents,
      action: 'start the deposit top-up payment',
    });
  }

  /**
   * The open checkout session of this kind when it is for this amount, otherwise a new one (an
   * open one for another amount, from before a revision, is closed first so it cannot be paid).
   * Attempt numbers name the idempotency keys; a key already used with other parameters (an
   * earlier try whose answer never reached us) moves on to the next attempt.
   */
  private async openOrNewSession(
    em: EntityManager,
    booking: Booking,
    workshop: Workshop,
    now: Date,
    { kind, amountCents, action }: { kind: PaymentKind; amountCents: number; action: string },
  ): Promise<DepositCheckout> {
    const payments = booking.payments.getItems();
    const open = payments.find((payment) => payment.kind === kind && payment.status === 'open');
    if (open && open.amountCents === amountCents) {
      return { checkoutUrl: open.checkoutUrl, expiresAt: open.expiresAt };
    }
    if (open) await this.closeSession(open, now);

    let attempt = payments.reduce((highest, payment) => Math.max(highest, payment.attempt), 0) + 1;
    for (let tries = 1; ; tries += 1, attempt += 1) {
      try {
        const payment = await this.createSession(booking, workshop, attempt, now, {
          kind,
          amountCents,
        });
        em.persist(payment);
        return { checkoutUrl: payment.checkoutUrl, expiresAt: payment.expiresAt };
      } catch (error) {
        if (isIdempotencyConflict(error) && tries < ATTEMPT_TRIES) continue;
        if (error instanceof BadGatewayException) throw error;
        throw providerFailure(error, this.logger, {
          action,
          unchanged: 'Nothing was charged and the booking is unchanged.',
        });
      }
    }
  }

  /**
   * Gives back what the cancellation policy allows of each paid payment of the booking, through
   * the provider, before the caller marks the booking cancelled; each refund is recorded. Open
   * checkout sessions are closed at the provider so they can no longer be paid (if one is paid
   * anyway, its webhook refunds it in full). A provider failure is a 502: nothing is cancelled.
   * Returns the refunds made.
   */
  async refundOnCancellation(
    em: EntityManager,
    booking: Booking,
    policy: CancellationPolicy,
    now: Date,
  ): Promise<Refund[]> {
    const made: Refund[] = [];
    const payments = booking.payments.getItems();
    for (const payment of payments.filter((candidate) => candidate.status === 'open')) {
      await this.closeSession(payment, now);
    }
    const refundable = payments.filter((payment) => heldCents(payment) > 0);
    for (const payment of refundable) {
      const outcome = cancellationRefund({
        depositHeldCents: heldCents(payment),
        startsAtMs: booking.startsAt.getTime(),
        cancelledAtMs: now.getTime(),
        policy,
      });
      if (outcome.refundCents === 0) continue;
      const reason =
        outcome.basis === 'full'
          ? `Cancelled at least ${policy.fullRefundHoursBefore} hours before the start: the whole deposit back.`
          : `Cancelled less than ${policy.fullRefundHoursBefore} hours before the start: ${policy.lateCancelRefundPercent} % of the deposit back.`;
      const key =
        refundable.length === 1
          ? `refund-${booking.id}`
          : `refund-${booking.id}-${payment.attempt}`;
      made.push(await this.refund(em, booking, payment, outcome.refundCents, reason, key));
    }
    return made;
  }

  /**
   * Gives back the whole of a payment that must not be kept (it arrived after the booking's
   * hold was let go, or the deposit was already paid by another session).
   */
  async refundInFull(
    em: EntityManager,
    booking: Booking,
    payment: Payment,
    reason: string,
  ): Promise<Refund | null> {
    const amount = heldCents(payment);
    if (amount === 0) return null;
    return this.refund(em, booking, payment, amount, reason, `refund-unkept-${payment.id}`);
  }

  // ---------------------------------------------------------------------------------------

  private async createSession(
    booking: Booking,
    workshop: Workshop,
    attempt: number,
    now: Date,
    charge: { kind: PaymentKind; amountCents: number },
  ): Promise<Payment> {
    const paymentId = randomUUID();
    const version = booking.quoteVersion;
    const metadata = {
      bookingId: booking.id,
      paymentId,
      quoteVersionId: version.id,
      bookingReference: bookingReference(booking.number),
    };
    const bookingUrl = `${this.config.publicUrl}/account/bookings/${booking.id}`;
    const session: Stripe.Checkout.Session = await this.client.checkout.sessions.create(
      {
        mode: 'payment',
        line_items: [
          {
            quantity: 1,
            price_data: {
              currency: workshop.currency.toLowerCase(),
              unit_amount: charge.amountCents,
              product_data: { name: paymentDescription(booking, charge.kind) },
            },
          },
        ],
        metadata,
        payment_intent_data: { metadata },
        success_url: `${bookingUrl}/paid?session_id={CHECKOUT_SESSION_ID}`,
        // A top-up comes back to the same two pages of the booking as the deposit.
        cancel_url: `${bookingUrl}/deposit-cancelled`,
        expires_at:
          Math.ceil(now.getTime() / 1000) + CHECKOUT_MINUTES * 60 + CHECKOUT_MARGIN_SECONDS,
        customer_email: booking.customer.email,
      },
      { idempotencyKey: `${charge.kind}-${booking.id}-${attempt}` },
    );
    if (!session.url) {
      throw new BadGatewayException(
        'The payment provider did not give a payment page. Nothing was charged; try again in a minute.',
      );
    }
    return new Payment({
      id: paymentId,
      booking,
      kind: charge.kind,
      checkoutSessionId: session.id,
      amountCents: session.amount_total ?? charge.amountCents,
      currency: session.currency ?? workshop.currency.toLowerCase(),
      attempt,
      checkoutUrl: session.url,
      expiresAt: new Date(session.expires_at * 1000),
    });
  }

  private keepHoldUntil(booking: Booking, until: Date): void {
    if (!booking.holdExpiresAt || booking.holdExpiresAt < until) booking.holdExpiresAt = until;
  }

  /** Closes an open session at the provider; one that can no longer be closed stays as it is. */
  private async closeSession(payment: Payment, now: Date): Promise<void> {
    if (payment.expiresAt <= now) {
      payment.status = 'expired';
      return;
    }
    try {
      await this.client.checkout.sessions.expire(payment.checkoutSessionId);
      payment.status = 'expired';
    } catch (error) {
      // Paid a moment ago, or the provider is away: its webhook tells what happened.
      this.logger.warn(
        `Could not close checkout session of payment ${payment.id}: ${error instanceof Error ? error.message : String(error)}`,
      );
    }
  }

  private async refund(
    em: EntityManager,
    booking: Booking,
    payment: Payment,
    amountCents: number,
    reason: string,
    idempotencyKey: string,
  ): Promise<Refund> {
    if (!payment.paymentIntentId) {
      throw new BadGatewayException(
        'The payment is not fully recorded yet, so it cannot be refunded. The booking is unchanged; try again in a minute.',
      );
    }
    let refund: Stripe.Refund;
    try {
      refund = await this.client.refunds.create(
        {
          payment_intent: payment.paymentIntentId,
          amount: amountCents,
          metadata: {
            bookingId: booking.id,
            paymentId: payment.id,
            bookingReference: bookingReference(booking.number),
          },
        },
        { idempotencyKey },
      );
    } catch (error) {
      throw providerFailure(error, this.logger, {
        action: 'make the refund',
        unchanged: 'The booking is unchanged.',
      });
    }
    const existing = await em.findOne(Refund, { providerRefundId: refund.id });
    if (existing) return existing;
    const row = new Refund({
      payment,
      providerRefundId: refund.id,
      amountCents: refund.amount,
      status: refund.status ?? 'pending',
      reason,
    });
    em.persist(row);
    payment.refundedCents = Math.min(payment.amountCents, payment.refundedCents + refund.amount);
    return row;
  }
}
