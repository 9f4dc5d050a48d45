import { EntityManager } from '@mikro-orm/postgresql';
import { BadRequestException, Inject, Injectable, Logger } from '@nestjs/common';
import Stripe from 'stripe';
import { bookingReference } from '../bookings/booking-states';
import { Booking } from '../bookings/entities/booking.entity';
import { AppConfigService } from '../config/app-config.service';
import { vehicleName } from '../fit-reports/fit-reports.service';
import { quoteReference } from '../quotes/quote-reference';
import { loadWorkshop } from '../workshop/workshop.service';
import { bookingRequestedMessage } from '../notifications/messages/booking-messages';
import { amount } from '../notifications/messages/customer-message';
import { recordBookingEvent } from '../bookings/booking-events';
import {
  depositReceiptMail,
  type DepositReceiptMailInput,
} from '../notifications/messages/deposit-receipt.message';
import { NotificationsService } from '../notifications/notifications.service';
import { Payment } from './entities/payment.entity';
import { Refund } from './entities/refund.entity';
import { heldCents, paymentSummary } from './payment-summary';
import { PAYMENTS_CLIENT, type PaymentsClient } from './payments-client';
import { PaymentsService } from './payments.service';

/** The header the provider signs its events in. */
export const SIGNATURE_HEADER = 'stripe-signature';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export interface WebhookOutcome {
  received: true;
  duplicate: boolean;
}

function idOf(value: string | { id: string } | null | undefined): string | null {
  if (!value) return null;
  return typeof value === 'string' ? value : value.id;
}

/**
 * The provider's events, delivered at least once, in any order, perhaps many times. Each one is
 * verified against its signature, then handled in one transaction together with the insert of
 * its id into processed_webhook_event: a repeat finds the id and changes nothing. The two events
 * of a successful payment (checkout.session.completed and payment_intent.succeeded) each do the
 * whole work when they come first and nothing when they come second.
 */
@Injectable()
export class PaymentWebhooksService {
  private readonly logger = new Logger(PaymentWebhooksService.name);

  constructor(
    private readonly em: EntityManager,
    @Inject(PAYMENTS_CLIENT) private readonly client: PaymentsClient,
    private readonly config: AppConfigService,
    private readonly payments: PaymentsService,
    private readonly notifications: NotificationsService,
  ) {}

  /** The event, if the signature matches the exact bytes received and is recent (300 s). */
  verify(rawBody: Buffer | undefined, signature: string | string[] | undefined): Stripe.Event {
    if (typeof signature !== 'string' || signature.trim() === '') {
      throw new BadRequestException('The event is not signed: the signature header is missing.');
    }
    if (!rawBody || rawBody.length === 0) {
      throw new BadRequestException('The event has no JSON body.');
    }
    try {
      return this.client.webhooks.constructEvent(
        rawBody,
        signature,
        this.config.paymentsWebhookSecret,
      );
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      this.logger.warn(`Refused a webhook call: ${message}`);
      if (/tolerance/i.test(message)) {
        throw new BadRequestException(
          'The event’s signature is too old (more than 300 seconds): it is not accepted.',
        );
      }
      throw new BadRequestException('The event’s signature does not match its body.');
    }
  }

  async handle(event: Stripe.Event): Promise<WebhookOutcome> {
    const fresh = await this.em.fork().transactional(async (em) => {
      const recorded = await em.execute<{ event_id: string }[]>(
        `insert into processed_webhook_event (event_id, type, received_at) values (?, ?, ?)
           on conflict (event_id) do nothing returning event_id`,
        [event.id, event.type, new Date()],
      );
      // Another delivery of this event got there first (it waits here until that one commits).
      if (recorded.length === 0) return false;
      await this.apply(em, event);
      return true;
    });
    return { received: true, duplicate: !fresh };
  }

  private async apply(em: EntityManager, event: Stripe.Event): Promise<void> {
    const paidAt = new Date(event.created * 1000);
    switch (event.type) {
      case 'checkout.session.completed':
      case 'checkout.session.async_payment_succeeded': {
        const session = event.data.object;
        if (session.payment_status !== 'paid') return;
        const found = await this.paymentBy(em, { checkoutSessionId: session.id });
        if (found) await this.recordPaid(em, found, idOf(session.payment_intent), paidAt);
        return;
      }
      case 'payment_intent.succeeded': {
        const intent = event.data.object;
        const paymentId = intent.metadata?.paymentId;
        const found =
          (await this.paymentBy(em, { paymentIntentId: intent.id })) ??
          (paymentId && UUID.test(paymentId)
            ? await this.paymentBy(em, { id: paymentId, paymentIntentId: null })
            : null);
        if (found) await this.recordPaid(em, found, intent.id, paidAt);
        return;
      }
      case 'checkout.session.expired':
      case 'checkout.session.async_payment_failed': {
        const found = await this.paymentBy(em, { checkoutSessionId: event.data.object.id });
        if (found && found.status === 'open') {
          found.status = event.type === 'checkout.session.expired' ? 'expired' : 'failed';
          await em.flush();
        }
        return;
      }
      case 'charge.refunded':
        await this.recordRefunds(em, event.data.object);
        return;
      default:
        // Recorded (so a repeat is recognised) and otherwise ignored.
        return;
    }
  }

  /**
   * Our payment for the provider's object, with its booking locked first (bookings are always
   * locked before their payments, here and in the booking service); null when it is not ours.
   */
  private async paymentBy(
    em: EntityManager,
    where:
      | { checkoutSessionId: string }
      | { paymentIntentId: string }
      | { id: string; paymentIntentId: null },
  ): Promise<Payment | null> {
    const column =
      'checkoutSessionId' in where
        ? ['checkout_session_id = ?', where.checkoutSessionId]
        : 'id' in where
          ? ['id = ? and payment_intent_id is null', where.id]
          : ['payment_intent_id = ?', where.paymentIntentId];
    const [row] = await em.execute<{ id: string; booking_id: string }[]>(
      `select id, booking_id from payment where ${column[0]}`,
      [column[1]],
    );
    if (!row) {
      this.logger.log(`An event names a payment that is not ours (${String(column[1])})`);
      return null;
    }
    await em.execute('select id from booking where id = ? for update', [row.booking_id]);
    return em.findOneOrFail(Payment, row.id, {
      populate: [
        'booking',
        'booking.customer',
        'booking.payments',
        'booking.quoteVersion',
        'booking.quoteVersion.quote',
        'booking.quoteVersion.quote.vehicleModel',
      ],
    });
  }

  /**
   * The payment is paid: the booking's hold becomes a request. When the booking is no longer
   * held (cancelled or run out before the payment came in) or its deposit was already paid, it
   * is not revived: the payment is refunded in full. Already paid: nothing changes. A top-up
   * leaves the state as it is; one for a booking that is over, or beyond what was due, is
   * refunded in full. Each outcome is written to the booking's audit trail (no actor: the
   * provider).
   */
  private async recordPaid(
    em: EntityManager,
    payment: Payment,
    paymentIntentId: string | null,
    paidAt: Date,
  ): Promise<void> {
    if (payment.status === 'paid') {
      if (!payment.paymentIntentId && paymentIntentId) payment.paymentIntentId = paymentIntentId;
      await em.flush();
      return;
    }
    if (payment.kind === 'top-up') {
      await this.recordTopUpPaid(em, payment, paymentIntentId, paidAt);
      return;
    }
    payment.status = 'paid';
    payment.paymentIntentId ??= paymentIntentId;
    payment.paidAt = paidAt;
    const booking = payment.booking;
    const now = new Date();
    const paid = amount(payment.amountCents, payment.currency);
    const alreadyPaid = booking.payments
      .getItems()
      .some((other) => other !== payment && other.kind === 'deposit' && other.status === 'paid');
    let refundedInFullCents: number | undefined;
    const requested = booking.state === 'held' && !alreadyPaid;
    if (requested) {
      booking.state = 'requested';
      booking.stateChangedAt = now;
      booking.holdExpiresAt = null;
      recordBookingEvent(em, booking, 'deposit-paid', `Deposit of ${paid} paid.`, null, now);
      recordBookingEvent(
        em,
        booking,
        'requested',
        'Requested: waiting for the workshop to confirm the time.',
        null,
        now,
      );
    } else {
      const why = alreadyPaid
        ? 'The deposit was already paid by another payment: this one back in full.'
        : `Paid after the booking was ${booking.state}: the whole payment back.`;
      await em.flush();
      const refund = await this.payments.refundInFull(em, booking, payment, why);
      refundedInFullCents = refund?.amountCents;
      recordBookingEvent(
        em,
        booking,
        'deposit-paid',
        `Deposit of ${paid} paid; ${refund ? `${amount(refund.amountCents, payment.currency)} refunded` : 'nothing refunded'}: ${why}`,
        null,
        now,
      );
    }
    await em.flush();
    // In this transaction: the messages exist exactly when the payment is recorded.
    await this.notifications.queue(em, {
      causeKey: `deposit-receipt:${payment.id}`,
      to: booking.customer.email,
      content: depositReceiptMail(
        await this.receiptInput(em, booking, payment, refundedInFullCents),
      ),
    });
    if (requested) {
      await this.notifications.queue(em, {
        causeKey: `booking-requested:${booking.id}`,
        to: booking.customer.email,
        content: bookingRequestedMessage(
          await this.notifications.bookingInput(em, booking, new Date()),
        ),
      });
    }
  }

  /**
   * A paid top-up: recorded without changing the booking's state. When the booking is over
   * (cancelled or expired) or the deposit was already made up by another payment, the
   * whole payment goes back, as a late deposit does. A receipt is queued either way.
   */
  private async recordTopUpPaid(
    em: EntityManager,
    payment: Payment,
    paymentIntentId: string | null,
    paidAt: Date,
  ): Promise<void> {
    const booking = payment.booking;
    const now = new Date();
    // Judged by the other payments as they are now: was anything still due?
    const heldByOthers = booking.payments
      .getItems()
      .filter((other) => other !== payment)
      .reduce((sum, other) => sum + heldCents(other), 0);
    const over = booking.state === 'cancelled' || booking.state === 'expired';
    const keep = !over && heldByOthers < booking.quoteVersion.depositCents;
    payment.status = 'paid';
    payment.paymentIntentId ??= paymentIntentId;
    payment.paidAt = paidAt;
    const paid = amount(payment.amountCents, payment.currency);
    let refundedInFullCents: number | undefined;
    if (keep) {
      recordBookingEvent(em, booking, 'top-up-paid', `Deposit top-up of ${paid} paid.`, null, now);
    } else {
      const why = over
        ? `Paid after the booking was ${booking.state}: the whole payment back.`
        : 'The deposit was already paid in full: this top-up back in full.';
      await em.flush();
      const refund = await this.payments.refundInFull(em, booking, payment, why);
      refundedInFullCents = refund?.amountCents;
      recordBookingEvent(
        em,
        booking,
        'top-up-paid',
        `Deposit top-up of ${paid} paid; ${refund ? `${amount(refund.amountCents, payment.currency)} refunded` : 'nothing refunded'}: ${why}`,
        null,
        now,
      );
    }
    await em.flush();
    await this.notifications.queue(em, {
      causeKey: `deposit-receipt:${payment.id}`,
      to: booking.customer.email,
      content: depositReceiptMail(
        await this.receiptInput(em, booking, payment, refundedInFullCents),
      ),
    });
  }

  /** Records each refund of the charge not yet recorded, and the charge's refunded total. */
  private async recordRefunds(em: EntityManager, charge: Stripe.Charge): Promise<void> {
    const intentId = idOf(charge.payment_intent);
    if (!intentId) return;
    const payment = await this.paymentBy(em, { paymentIntentId: intentId });
    if (!payment) return;
    const refunds = await this.refundsOf(charge);
    for (const refund of refunds) {
      const existing = await em.findOne(Refund, { providerRefundId: refund.id });
      if (existing) {
        if (refund.status && existing.status !== refund.status) existing.status = refund.status;
        continue;
      }
      em.persist(
        new Refund({
          payment,
          providerRefundId: refund.id,
          amountCents: refund.amount,
          status: refund.status ?? 'pending',
          reason: 'Refunded at the payment provider.',
        }),
      );
    }
    payment.refundedCents = Math.min(payment.amountCents, Math.max(0, charge.amount_refunded));
    await em.flush();
  }

  /** The charge's refunds: from the event when it carries them all, otherwise from the API. */
  private async refundsOf(charge: Stripe.Charge): Promise<Stripe.Refund[]> {
    if (charge.refunds && !charge.refunds.has_more) return charge.refunds.data;
    return this.client.refunds.list({ charge: charge.id, limit: 100 }).autoPagingToArray({
      limit: 1000,
    });
  }

  private async receiptInput(
    em: EntityManager,
    booking: Booking,
    payment: Payment,
    refundedInFullCents: number | undefined,
  ): Promise<DepositReceiptMailInput> {
    const workshop = await loadWorkshop(em);
    const version = booking.quoteVersion;
    const summary = paymentSummary({
      state: booking.state,
      startsAtMs: booking.startsAt.getTime(),
      totalCents: version.totalCents,
      depositCents: version.depositCents,
      payments: booking.payments.getItems(),
      policy: workshop,
      nowMs: Date.now(),
    });
    return {
      customerName: booking.customer.name,
      workshop,
      bookingReference: bookingReference(booking.number),
      quoteReference: `${quoteReference(version.quote.number)} v${version.number}`,
      vehicleName: vehicleName(version.quote.vehicleModel),
      startsAt: booking.startsAt,
      timeZone: workshop.timeZone,
      currency: payment.currency,
      amountPaidCents: payment.amountCents,
      paidAt: payment.paidAt ?? new Date(),
      balanceDueCents: summary.balanceDueCents,
      kind: payment.kind,
      ...(refundedInFullCents !== undefined ? { refundedInFullCents } : {}),
    };
  }
}
