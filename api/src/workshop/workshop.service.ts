import { LockMode } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable, InternalServerErrorException } from '@nestjs/common';
import { FieldErrorsException } from '../common/errors/field-errors.exception';
import type { CancellationPolicy } from '../pricing/cancellation-refund';
import type { PricingPolicy } from '../pricing/pricing.types';
import { PolicyResponse } from './dto/policy.response';
import type { UpdatePolicyDto } from './dto/update-policy.dto';
import { WorkshopCardResponse } from './dto/workshop-card.response';
import { Workshop } from './entities/workshop.entity';
import { assignPolicy, policyFieldErrors, pricingPolicyOf } from './policy-mapping';
import { endOfLocalDay, localDateOf } from './workshop-time';

/** The card, the engine's policy, the time zone and the cancellation policy, read together (one query). */
export interface WorkshopSettings {
  card: WorkshopCardResponse;
  pricingPolicy: PricingPolicy;
  timeZone: string;
  cancellationPolicy: CancellationPolicy;
}

/**
 * The one workshop row (the oldest, should a second ever appear). With `forUpdate`, inside a
 * transaction: locked until it ends, so set-up changes made at the same time run one after the
 * other.
 */
export async function loadWorkshop(em: EntityManager, forUpdate = false): Promise<Workshop> {
  const [workshop] = await em.find(
    Workshop,
    {},
    {
      orderBy: { createdAt: 'asc', id: 'asc' },
      limit: 1,
      ...(forUpdate ? { lockMode: LockMode.PESSIMISTIC_WRITE } : {}),
    },
  );
  if (!workshop) {
    throw new InternalServerErrorException(
      'The workshop is not set up: run the database seed first',
    );
  }
  return workshop;
}

/** The card, policy and time zone of a workshop row already loaded. */
export function settingsOf(workshop: Workshop): WorkshopSettings {
  return {
    card: WorkshopCardResponse.from(workshop),
    pricingPolicy: pricingPolicyOf(workshop),
    timeZone: workshop.timeZone,
    cancellationPolicy: {
      fullRefundHoursBefore: workshop.fullRefundHoursBefore,
      lateCancelRefundPercent: workshop.lateCancelRefundPercent,
    },
  };
}

/**
 * The one workshop row: its card and its pricing policy. Read per request (several API
 * processes may serve the shop, so nothing is cached in memory).
 */
@Injectable()
export class WorkshopService {
  constructor(private readonly em: EntityManager) {}

  async card(): Promise<WorkshopCardResponse> {
    return WorkshopCardResponse.from(await this.load());
  }

  async settings(): Promise<WorkshopSettings> {
    return settingsOf(await this.load());
  }

  async policy(): Promise<PolicyResponse> {
    const workshop = await this.load();
    return PolicyResponse.from(pricingPolicyOf(workshop), workshop.updatedAt);
  }

  /** Replaces the whole policy; refused with field errors (and nothing changed) when the engine would refuse it. */
  async updatePolicy(dto: UpdatePolicyDto): Promise<PolicyResponse> {
    const workshop = await this.load();
    const policy: PricingPolicy = {
      labourRateCentsPerHour: dto.labourRateCentsPerHour,
      pricesIncludeTax: dto.pricesIncludeTax,
      taxRatePercent: dto.taxRatePercent,
      taxRoundingMethod: dto.taxRoundingMethod,
      fittingBalancingCentsPerWheel: dto.fittingBalancingCentsPerWheel,
      tyreDisposalCentsPerTyre: dto.tyreDisposalCentsPerTyre,
      bundleDiscount: {
        enabled: dto.bundleDiscount.enabled,
        percent: dto.bundleDiscount.percent,
        requiresKinds: [...dto.bundleDiscount.requiresKinds],
      },
      deposit: {
        percent: dto.deposit.percent,
        floorCents: dto.deposit.floorCents,
        capCents: dto.deposit.capCents,
        specialOrderPercent: dto.deposit.specialOrderPercent,
      },
      quoteValidDays: dto.quoteValidDays,
    };
    const errors = policyFieldErrors(policy);
    if (Object.keys(errors).length > 0) {
      throw new FieldErrorsException(errors, 'The policy is not consistent');
    }
    assignPolicy(workshop, policy);
    await this.em.flush();
    return PolicyResponse.from(pricingPolicyOf(workshop), workshop.updatedAt);
  }

  /** The workshop-local calendar date (YYYY-MM-DD) of an instant. */
  async localDate(instant: Date): Promise<string> {
    return localDateOf(instant, (await this.load()).timeZone);
  }

  /** The end of a workshop-local calendar day, as a UTC instant. */
  async endOfDay(date: string): Promise<Date> {
    return endOfLocalDay(date, (await this.load()).timeZone);
  }

  private load(): Promise<Workshop> {
    return loadWorkshop(this.em);
  }
}
