import { type FilterQuery, LockMode, raw } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/postgresql';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { FieldErrorsException } from '../common/errors/field-errors.exception';
import { AppConfigService } from '../config/app-config.service';
import { FitReportResponse } from '../fit-reports/dto/fit-report.response';
import { vehicleName } from '../fit-reports/fit-reports.service';
import { quoteSavedMessage } from '../notifications/messages/booking-messages';
import { NotificationsService } from '../notifications/notifications.service';
import { Upload } from '../uploads/entities/upload.entity';
import { User } from '../users/entities/user.entity';
import type { Role } from '../users/user-role';
import { escapeLike } from '../vehicles/vehicles.service';
import { WorkshopService, loadWorkshop } from '../workshop/workshop.service';
import { localDateOf } from '../workshop/workshop-time';
import type { CreateQuoteDto } from './dto/create-quote.dto';
import { PackagePriceResponse } from './dto/package-price.response';
import type { QuoteListQueryDto } from './dto/quote-list-query.dto';
import type { QuotePackageDto } from './dto/quote-package.dto';
import type { QuotePreviewResponse } from './dto/quote-preview.response';
import type { QuoteListResponse, QuoteSummaryResponse } from './dto/quote-summary.response';
import type { QuoteResponse, QuoteVersionResponse } from './dto/quote.response';
import { QuoteLine } from './entities/quote-line.entity';
import { QuoteVersion } from './entities/quote-version.entity';
import { Quote } from './entities/quote.entity';
import {
  answerRefusal,
  bookingRefusal,
  effectiveState,
  isBookable,
  sendRefusal,
} from './quote-lifecycle';
import { QuoteHooks } from './quote-hooks';
import {
  type PricedPackage,
  QuotePackagesService,
  type VehicleOwnerRule,
} from './quote-packages.service';
import { renderQuotePdf } from './quote-pdf';
import {
  quoteNumberFromSearch,
  quotePdfFileName,
  quotePdfUrl,
  quoteReference,
} from './quote-reference';
import type { QuoteVersionState } from './quote-states';

export const QUOTE_NOT_FOUND = 'No quote has this id';
/** Staff who see every customer's quotes. */
const QUOTE_DESK_ROLES: readonly Role[] = ['desk', 'manager'];
const LIST_LIMIT = 200;
const QUOTE_POPULATE = [
  'customer',
  'vehicleModel',
  'customerVehicle',
  'versions.lines',
  'versions.createdBy',
] as const;

function seesEveryQuote(user: User): boolean {
  return QUOTE_DESK_ROLES.includes(user.role);
}

/** Newest version first is the last one: versions are loaded in number order. */
/**
 * The newest version. Every quote the API saves has one (quote and version 1 are written in one
 * transaction); a row written past the API without one is left out of lists, not a 500.
 */
function latestOf(quote: Quote): QuoteVersion | undefined {
  const versions = quote.versions.getItems();
  if (versions.length === 0) return undefined;
  return versions.reduce((latest, version) => (version.number > latest.number ? version : latest));
}

/**
 * Quotes: the preview (writes nothing), saving version 1, the lists and the detail a customer
 * or the desk may see, the PDF, and the version's state changes (accept, decline, send).
 */
@Injectable()
export class QuotesService {
  constructor(
    private readonly em: EntityManager,
    private readonly packages: QuotePackagesService,
    private readonly workshop: WorkshopService,
    private readonly notifications: NotificationsService,
    private readonly config: AppConfigService,
    private readonly hooks: QuoteHooks,
  ) {}

  async preview(dto: QuotePackageDto, user: User | null): Promise<QuotePreviewResponse> {
    const rule: VehicleOwnerRule = !user
      ? { kind: 'anonymous' }
      : user.role === 'customer'
        ? { kind: 'owner', owner: user, ownerIsCaller: true }
        : { kind: 'staff' };
    const priced = await this.packages.price(dto, rule);
    return {
      price: PackagePriceResponse.from(priced.price),
      fitReport: FitReportResponse.from(priced.fitReport),
      wheelsFitted: priced.wheelsFitted,
      tyresReplaced: priced.tyresReplaced,
      validUntilDate: priced.validUntilDate,
      vehicle: { vehicleModelId: priced.vehicle.id, name: vehicleName(priced.vehicle) },
    };
  }

  /**
   * Saves the package as a new quote with version 1, in one transaction: `sent` when the
   * customer saves it, `draft` when the desk builds it for a walk-in customer.
   */
  async create(dto: CreateQuoteDto, user: User): Promise<QuoteResponse> {
    const savedByCustomer = user.role === 'customer';
    if (savedByCustomer && dto.customerId !== undefined) {
      throw new FieldErrorsException({
        customerId: ['leave this out: a customer saves quotes for themselves'],
      });
    }
    if (!savedByCustomer && dto.customerId === undefined) {
      throw new FieldErrorsException({
        customerId: ['is required: choose the customer this quote is for'],
      });
    }
    const now = new Date();
    const quoteId = await this.em.transactional(async (em) => {
      const customer = savedByCustomer
        ? user
        : await em.findOne(User, { id: dto.customerId, role: 'customer', active: true });
      if (!customer) throw new FieldErrorsException({ customerId: ['no customer has this id'] });

      const photoIds = dto.photoIds ?? [];
      const photos =
        photoIds.length > 0
          ? await em.find(Upload, {
              id: { $in: photoIds },
              // A walk-in's photos are taken by the desk: theirs or the customer's own.
              owner: savedByCustomer ? customer : { $in: [customer, user] },
              quote: null,
            })
          : [];
      const missing = photoIds.filter((id) => !photos.some((photo) => photo.id === id));
      if (missing.length > 0) {
        throw new FieldErrorsException({
          photoIds: [
            `${savedByCustomer ? 'you have no' : 'neither you nor the customer has an'} unattached photo with the id ${missing.join(', ')}`,
          ],
        });
      }

      const priced = await this.packages.price(
        dto,
        { kind: 'owner', owner: customer, ownerIsCaller: savedByCustomer },
        now,
      );
      if (priced.fitReport.verdict === 'does-not-fit') {
        throw new FieldErrorsException(
          {
            items: priced.fitReport.checks
              .filter((check) => check.verdict === 'does-not-fit')
              .map((check) => check.message),
          },
          'This package does not fit the vehicle, so it cannot be saved as a quote',
        );
      }

      const quote = new Quote(customer, user, priced.vehicle);
      quote.customerVehicle = priced.customerVehicle;
      quote.vehicleYear = dto.vehicleYear ?? priced.customerVehicle?.year ?? null;
      quote.uses = [...dto.uses];
      quote.constantLoadKg = priced.constantLoadKg;
      quote.createdAt = now;
      const { version, lines } = newVersionOf(quote, priced, {
        number: 1,
        state: savedByCustomer ? 'sent' : 'draft',
        createdBy: user,
        now,
      });
      for (const photo of photos) {
        photo.quote = quote;
        // The photos belong to the customer from now on (they see them with the quote).
        photo.owner = customer;
      }
      em.persist([quote, version, ...lines]);
      await em.flush();
      if (savedByCustomer) {
        // A desk's draft is the desk's until it is sent; the customer's own quote is told now.
        const workshop = await loadWorkshop(em);
        await this.notifications.queue(em, {
          causeKey: `quote-saved:${version.id}`,
          to: customer.email,
          content: quoteSavedMessage({
            customer: { name: customer.name, email: customer.email },
            workshop,
            timeZone: workshop.timeZone,
            quoteReference: `${quoteReference(quote.number)} v${version.number}`,
            vehicleName: vehicleName(priced.vehicle),
            currency: workshop.currency,
            totalCents: version.totalCents,
            depositCents: version.depositCents,
            validUntilDate: version.validUntilDate,
            quoteUrl: `${this.config.publicUrl}/account/quotes`,
          }),
        });
      }
      return quote.id;
    });
    return this.get(quoteId, user);
  }

  async list(query: QuoteListQueryDto, user: User): Promise<QuoteListResponse> {
    const conditions: FilterQuery<Quote>[] = [];
    if (!seesEveryQuote(user)) conditions.push({ customer: user.id });
    if (query.customerId) conditions.push({ customer: query.customerId });
    if (query.q) {
      const pattern = `%${escapeLike(query.q)}%`;
      const number = quoteNumberFromSearch(query.q);
      conditions.push({
        $or: [
          ...(number !== null ? [{ number }] : []),
          { customer: { name: { $ilike: pattern } } },
          { customer: { email: { $ilike: pattern } } },
          { customerVehicle: { rego: { $ilike: pattern } } },
        ],
      });
    }
    const quotes = await this.em.find(
      Quote,
      { $and: conditions },
      {
        populate: ['customer', 'vehicleModel', 'versions'],
        orderBy: { createdAt: 'desc', number: 'desc' },
        limit: LIST_LIMIT,
      },
    );
    const now = new Date();
    await this.persistExpiry(
      quotes.flatMap((quote) => quote.versions.getItems()),
      now,
    );
    return {
      items: quotes.flatMap((quote): QuoteSummaryResponse[] => {
        const latest = latestOf(quote);
        if (!latest) return [];
        const summary: QuoteSummaryResponse = {
          id: quote.id,
          number: quote.number,
          reference: quoteReference(quote.number),
          customer: {
            id: quote.customer.id,
            name: quote.customer.name,
            email: quote.customer.email,
          },
          vehicleName: vehicleName(quote.vehicleModel),
          latestVersion: {
            number: latest.number,
            state: effectiveState(latest, now),
            totalCents: latest.totalCents,
            depositCents: latest.depositCents,
            validUntilDate: latest.validUntilDate,
            createdAt: latest.createdAt.toISOString(),
          },
          versionCount: quote.versions.length,
          createdAt: quote.createdAt.toISOString(),
        };
        return [summary];
      }),
    };
  }

  /** The quote as its customer or the desk sees it; another customer's quote is 404. */
  async get(id: string, user: User): Promise<QuoteResponse> {
    const quote = await this.loadVisible(id, user);
    const now = new Date();
    await this.persistExpiry(quote.versions.getItems(), now);
    return this.responseOf(quote, now);
  }

  async pdf(
    id: string,
    versionNumber: number,
    user: User,
  ): Promise<{ fileName: string; bytes: Buffer }> {
    const quote = await this.loadVisible(id, user);
    const version = versionOf(quote, versionNumber);
    const now = new Date();
    await this.persistExpiry([version], now);
    const bytes = await this.renderPdf(quote, version, now);
    return { fileName: quotePdfFileName(quote.number, version.number), bytes };
  }

  /**
   * The version as a PDF, from the rows given (the quote populated as `loadVisible` does), for
   * the download and for the revised-quote e-mail.
   */
  async renderPdf(quote: Quote, version: QuoteVersion, now: Date): Promise<Buffer> {
    const settings = await this.workshop.settings();
    return renderQuotePdf({
      card: settings.card,
      reference: quoteReference(quote.number),
      versionNumber: version.number,
      state: effectiveState(version, now),
      issuedOn: localDateOf(version.createdAt, settings.timeZone),
      validUntilDate: version.validUntilDate,
      customer: { name: quote.customer.name, email: quote.customer.email },
      vehicle: {
        name: vehicleName(quote.vehicleModel),
        year: quote.vehicleYear,
        rego: quote.customerVehicle?.rego ?? null,
        nickname: quote.customerVehicle?.nickname ?? null,
      },
      revisionReason: version.revisionReason,
      price: version.price,
      fitReport: version.fitReport,
      createdAt: version.createdAt,
    });
  }

  /** The customer accepts (or declines) the latest sent version; 409 with the reason otherwise. */
  answer(
    id: string,
    versionNumber: number,
    user: User,
    answer: 'accepted' | 'declined',
  ): Promise<QuoteResponse> {
    return this.changeState(id, versionNumber, user, answer, answerRefusal);
  }

  /** The desk sends a draft to the customer. */
  send(id: string, versionNumber: number, user: User): Promise<QuoteResponse> {
    return this.changeState(id, versionNumber, user, 'sent', sendRefusal);
  }

  /**
   * For bookings: the version, when it can be booked now (the latest version, sent or
   * accepted, within its dates). 404 when the user may not see it, 409 with the reason otherwise.
   */
  async assertBookable(quoteVersionId: string, user: User): Promise<QuoteVersion> {
    const version = await this.em.findOne(
      QuoteVersion,
      seesEveryQuote(user)
        ? { id: quoteVersionId }
        : { id: quoteVersionId, quote: { customer: user.id } },
      { populate: ['quote'] },
    );
    if (!version) throw new NotFoundException('No quote version has this id');
    const latest = await this.em.findOneOrFail(
      QuoteVersion,
      { quote: version.quote.id },
      { orderBy: { number: 'desc' } },
    );
    const refusal = bookingRefusal(version, latest.number, new Date());
    if (refusal) throw new ConflictException(refusal);
    return version;
  }

  private async changeState(
    id: string,
    versionNumber: number,
    user: User,
    next: QuoteVersionState,
    refusalOf: (version: QuoteVersion, latestNumber: number, now: Date) => string | null,
  ): Promise<QuoteResponse> {
    const now = new Date();
    const refusal = await this.em.transactional(async (em) => {
      const quote = await this.loadVisible(id, user);
      const loaded = versionOf(quote, versionNumber);
      // Lock the version's row and read it again: a concurrent answer or send waits for this
      // transaction, then sees the new state.
      const version = await em.findOneOrFail(
        QuoteVersion,
        { id: loaded.id },
        { lockMode: LockMode.PESSIMISTIC_WRITE, refresh: true },
      );
      const reason = refusalOf(version, latestOf(quote)?.number ?? version.number, now);
      if (reason) {
        await this.persistExpiry([version], now);
        return reason;
      }
      version.state = next;
      version.stateChangedAt = now;
      if (next === 'accepted') {
        // A booking on an earlier version follows the accepted one (or is flagged to move).
        await this.hooks.runAccepted({ em, quote, version, actor: user, now });
      } else if (next === 'declined') {
        await this.hooks.runDeclined({ em, quote, version, actor: user, now });
      }
      return null;
    });
    if (refusal) throw new ConflictException(refusal);
    return this.get(id, user);
  }

  /** The quote with its versions and lines, as the desk or its customer may see it; else 404. */
  async loadVisible(id: string, user: User): Promise<Quote> {
    const quote = await this.em.findOne(
      Quote,
      seesEveryQuote(user) ? { id } : { id, customer: user.id },
      { populate: QUOTE_POPULATE, refresh: true },
    );
    if (!quote) throw new NotFoundException(QUOTE_NOT_FOUND);
    return quote;
  }

  /**
   * Writes `expired` on draft and sent versions past their validity (the time it happened is
   * the end of the last valid day). The answers already read them as expired; this keeps the
   * table telling the same for reports and bookings. Guarded by the state, so it never
   * overwrites an answer given meanwhile.
   */
  private async persistExpiry(versions: QuoteVersion[], now: Date): Promise<void> {
    const lapsed = versions.filter(
      (version) => version.state !== 'expired' && effectiveState(version, now) === 'expired',
    );
    if (lapsed.length === 0) return;
    await this.em.nativeUpdate(
      QuoteVersion,
      {
        id: { $in: lapsed.map((version) => version.id) },
        state: { $in: ['draft', 'sent'] },
        validUntil: { $lt: now },
      },
      { state: 'expired', stateChangedAt: raw('valid_until'), updatedAt: now },
    );
  }

  private async responseOf(quote: Quote, now: Date): Promise<QuoteResponse> {
    const photos = await this.em.find(
      Upload,
      { quote: quote.id },
      { orderBy: { createdAt: 'asc', id: 'asc' } },
    );
    const latestNumber = latestOf(quote)?.number ?? 0;
    return {
      id: quote.id,
      number: quote.number,
      reference: quoteReference(quote.number),
      customer: { id: quote.customer.id, name: quote.customer.name, email: quote.customer.email },
      vehicle: {
        vehicleModelId: quote.vehicleModel.id,
        name: vehicleName(quote.vehicleModel),
        year: quote.vehicleYear,
        customerVehicle: quote.customerVehicle
          ? {
              id: quote.customerVehicle.id,
              nickname: quote.customerVehicle.nickname,
              rego: quote.customerVehicle.rego,
            }
          : null,
      },
      uses: [...quote.uses],
      constantLoadKg: quote.constantLoadKg,
      createdAt: quote.createdAt.toISOString(),
      photos: photos.map((photo) => ({
        id: photo.id,
        kind: photo.kind,
        widthPx: photo.widthPx,
        heightPx: photo.heightPx,
        url: `/api/uploads/${photo.id}`,
        thumbnailUrl: `/api/uploads/${photo.id}/thumbnail`,
      })),
      versions: quote.versions
        .getItems()
        .map((version) => versionResponseOf(quote, version, latestNumber, now)),
    };
  }
}

function versionOf(quote: Quote, versionNumber: number): QuoteVersion {
  const version = quote.versions.getItems().find((candidate) => candidate.number === versionNumber);
  if (!version) throw new NotFoundException(`This quote has no version ${versionNumber}`);
  return version;
}

function versionResponseOf(
  quote: Quote,
  version: QuoteVersion,
  latestNumber: number,
  now: Date,
): QuoteVersionResponse {
  const state = effectiveState(version, now);
  const expiredNow = state === 'expired' && version.state !== 'expired';
  return {
    id: version.id,
    number: version.number,
    state,
    stateChangedAt: (expiredNow ? version.validUntil : version.stateChangedAt).toISOString(),
    revisionReason: version.revisionReason,
    createdAt: version.createdAt.toISOString(),
    createdBy: { name: version.createdBy.name, role: version.createdBy.role },
    validUntilDate: version.validUntilDate,
    validUntil: version.validUntil.toISOString(),
    wheelsFitted: version.wheelsFitted,
    tyresReplaced: version.tyresReplaced,
    lines: version.lines.getItems().map((line) => ({
      position: line.position,
      productId: line.product?.id ?? null,
      sku: line.sku,
      name: line.name,
      brand: line.brand,
      kind: line.kind,
      quantity: line.quantity,
      unitPriceCents: line.unitPriceCents,
      labourMinutes: line.labourMinutes,
      bayKind: line.bayKind,
      leadDays: line.leadDays,
      stockQty: line.stockQty,
      perWheel: line.perWheel,
    })),
    price: PackagePriceResponse.from(version.price),
    fitReport: FitReportResponse.from(version.fitReport),
    bookable: isBookable(version, latestNumber, now),
    pdfUrl: quotePdfUrl(quote.id, version.number),
  };
}

/**
 * A new version of `quote` from a priced package, with its lines (the catalogue values it was
 * priced from, the labour as priced): not persisted.
 */
export function newVersionOf(
  quote: Quote,
  priced: PricedPackage,
  fields: { number: number; state: QuoteVersionState; createdBy: User; now: Date },
): { version: QuoteVersion; lines: QuoteLine[] } {
  const version = new QuoteVersion({
    quote,
    number: fields.number,
    state: fields.state,
    createdBy: fields.createdBy,
    wheelsFitted: priced.wheelsFitted,
    tyresReplaced: priced.tyresReplaced,
    validUntilDate: priced.validUntilDate,
    validUntil: priced.validUntil,
    price: priced.price,
    fitReport: priced.fitReport,
  });
  version.createdAt = fields.now;
  version.stateChangedAt = fields.now;
  const lines = priced.selected.map(
    ({ product, quantity }, index) =>
      new QuoteLine(version, {
        position: index + 1,
        product,
        sku: product.sku,
        name: product.name,
        brand: product.brand,
        kind: product.kind,
        quantity,
        unitPriceCents: product.priceCents,
        labourMinutes: priced.lines[index].labourMinutes,
        bayKind: product.bayKind,
        leadDays: product.leadDays,
        stockQty: product.stockQty,
        perWheel: priced.lines[index].perWheel === true,
      }),
  );
  return { version, lines };
}
