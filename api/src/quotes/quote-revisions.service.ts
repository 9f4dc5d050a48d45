import { LockMode } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/postgresql';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { Booking } from '../bookings/entities/booking.entity';
import { ACTIVE_BOOKING_STATES, bookingReference } from '../bookings/booking-states';
import { FieldErrorsException } from '../common/errors/field-errors.exception';
import { AppConfigService } from '../config/app-config.service';
import { FitReportResponse } from '../fit-reports/dto/fit-report.response';
import { vehicleName } from '../fit-reports/fit-reports.service';
import { workshopDateTime } from '../notifications/messages/customer-message';
import { revisedQuoteMessage } from '../notifications/messages/revised-quote.message';
import { NotificationsService } from '../notifications/notifications.service';
import type { User } from '../users/entities/user.entity';
import { loadWorkshop } from '../workshop/workshop.service';
import { PackagePriceResponse } from './dto/package-price.response';
import type { QuotePreviewResponse } from './dto/quote-preview.response';
import type { QuoteResponse } from './dto/quote.response';
import type { RevisionPackageDto, ReviseQuoteDto } from './dto/revise-quote.dto';
import type { QuoteVersion } from './entities/quote-version.entity';
import { Quote } from './entities/quote.entity';
import { QuoteHooks } from './quote-hooks';
import { type PricedPackage, QuotePackagesService } from './quote-packages.service';
import { quotePdfFileName, quoteReference } from './quote-reference';
import type { QuoteVersionState } from './quote-states';
import { QUOTE_NOT_FOUND, QuotesService, newVersionOf } from './quotes.service';

/** States a newer version replaces; a declined version keeps the customer's answer. */
const SUPERSEDED_BY_A_REVISION: readonly QuoteVersionState[] = [
  'draft',
  'sent',
  'accepted',
  'expired',
];

/**
 * The customer's page that shows a version beside the one before and takes the answer, named by
 * the reference the customer knows (Q-000123), not an internal id; the page finds the quote among
 * the signed-in customer's own.
 */
export function comparePath(quoteNumber: number, versionNumber: number): string {
  return `/account/quotes/${quoteReference(quoteNumber)}/versions/${versionNumber}/compare`;
}

/**
 * The desk revises a quote: the edited package (parts swapped, quantities, labour per line, a
 * workshop discount) is fit-checked and priced again and saved as the next version, sent to the
 * customer with the reason; the version before is superseded. The e-mail carries the new
 * version as a PDF and the link to compare and answer.
 */
@Injectable()
export class QuoteRevisionsService {
  constructor(
    private readonly em: EntityManager,
    private readonly packages: QuotePackagesService,
    private readonly quotes: QuotesService,
    private readonly notifications: NotificationsService,
    private readonly config: AppConfigService,
    private readonly hooks: QuoteHooks,
  ) {}

  /** The revision as it would be saved now: price and fit report; writes nothing. */
  async preview(id: string, dto: RevisionPackageDto, user: User): Promise<QuotePreviewResponse> {
    const quote = await this.quotes.loadVisible(id, user);
    const priced = await this.price(quote, dto);
    return {
      price: PackagePriceResponse.from(priced.price),
      fitReport: FitReportResponse.from(priced.fitReport),
      wheelsFitted: priced.wheelsFitted,
      tyresReplaced: priced.tyresReplaced,
      validUntilDate: priced.validUntilDate,
      vehicle: { vehicleModelId: priced.vehicle.id, name: vehicleName(priced.vehicle) },
    };
  }

  async revise(id: string, dto: ReviseQuoteDto, user: User): Promise<QuoteResponse> {
    const now = new Date();
    await this.em.transactional(async (em) => {
      // One revision of a quote at a time: a second waits, then numbers after this one.
      const locked = await em.findOne(Quote, { id }, { lockMode: LockMode.PESSIMISTIC_WRITE });
      if (!locked) throw new NotFoundException(QUOTE_NOT_FOUND);
      const quote = await this.quotes.loadVisible(id, user);
      const started = await em.findOne(Booking, {
        quoteVersion: { quote: quote.id },
        state: { $in: ['in-progress', 'completed'] },
      });
      if (started) {
        throw new ConflictException(
          `Booking ${bookingReference(started.number)} for this quote is ${started.state === 'completed' ? 'completed' : 'in progress'}: the work is closed against the version it was booked on, so the quote cannot be revised now.`,
        );
      }
      const versions = quote.versions.getItems();
      const previous = versions.reduce((latest, version) =>
        version.number > latest.number ? version : latest,
      );

      const priced = await this.price(quote, dto, now);
      if (priced.fitReport.verdict === 'does-not-fit') {
        throw new FieldErrorsException(
          {
            items: priced.fitReport.checks
              .filter((check) => check.verdict === 'does-not-fit')
              .map((check) => check.message),
          },
          'This package does not fit the vehicle, so it cannot be sent as a revision',
        );
      }

      if (SUPERSEDED_BY_A_REVISION.includes(previous.state)) {
        previous.state = 'superseded';
        previous.stateChangedAt = now;
      }
      const { version, lines } = newVersionOf(quote, priced, {
        number: previous.number + 1,
        state: 'sent',
        createdBy: user,
        now,
      });
      version.revisionReason = dto.reason;
      quote.customerVehicle = priced.customerVehicle ?? quote.customerVehicle;
      if (dto.vehicleYear !== undefined) quote.vehicleYear = dto.vehicleYear;
      quote.uses = [...dto.uses];
      quote.constantLoadKg = priced.constantLoadKg;
      em.persist([version, ...lines]);
      await em.flush();
      quote.versions.add(version);
      for (const line of lines) version.lines.add(line);

      await this.queueRevisedQuote(em, quote, previous, version, now);
      await this.hooks.runRevised({ em, quote, version, previous, actor: user, now });
    });
    return this.quotes.get(id, user);
  }

  private async price(quote: Quote, dto: RevisionPackageDto, now = new Date()) {
    if (dto.vehicleModelId !== quote.vehicleModel.id) {
      throw new FieldErrorsException({
        vehicleModelId: [
          `must be the quote's vehicle, the ${vehicleName(quote.vehicleModel)}: start a new quote for another vehicle`,
        ],
      });
    }
    const priced: PricedPackage = await this.packages.price(
      dto,
      { kind: 'owner', owner: quote.customer, ownerIsCaller: false },
      now,
    );
    return priced;
  }

  private async queueRevisedQuote(
    em: EntityManager,
    quote: Quote,
    previous: QuoteVersion,
    version: QuoteVersion,
    now: Date,
  ): Promise<void> {
    const workshop = await loadWorkshop(em);
    const booking = await em.findOne(
      Booking,
      { quoteVersion: { quote: quote.id }, state: { $in: [...ACTIVE_BOOKING_STATES] } },
      { orderBy: { startsAt: 'asc' } },
    );
    const reference = quoteReference(quote.number);
    await this.notifications.queue(em, {
      causeKey: `revised-quote:${version.id}`,
      to: quote.customer.email,
      content: revisedQuoteMessage({
        customer: { name: quote.customer.name, email: quote.customer.email },
        workshop,
        quoteReference: reference,
        versionNumber: version.number,
        previousVersionNumber: previous.number,
        vehicleName: vehicleName(quote.vehicleModel),
        currency: workshop.currency,
        reason: version.revisionReason ?? '',
        totalCents: version.totalCents,
        previousTotalCents: previous.totalCents,
        depositCents: version.depositCents,
        previousDepositCents: previous.depositCents,
        validUntilDate: version.validUntilDate,
        compareUrl: `${this.config.publicUrl}${comparePath(quote.number, version.number)}`,
        bookingLine: booking
          ? `${bookingReference(booking.number)}, ${workshopDateTime(booking.startsAt, workshop.timeZone)}`
          : null,
        pdf: {
          fileName: quotePdfFileName(quote.number, version.number),
          bytes: await this.quotes.renderPdf(quote, version, now),
        },
      }),
    });
  }
}
