import { Injectable } from '@nestjs/common';
import { ProductResponse } from '../catalogue/dto/product.response';
import { Product } from '../catalogue/entities/product.entity';
import { FieldErrorsException, type FieldErrors } from '../common/errors/field-errors.exception';
import { FitReportResponse } from '../fit-reports/dto/fit-report.response';
import { FitReportsService, isMadeFor, summaryOf } from '../fit-reports/fit-reports.service';
import { componentSpecOf } from '../fit-reports/fitment-input.mapper';
import { hubRingsMatch } from '../fitment/checks/wheel-checks';
import {
  type FitReport,
  type SuggestedAddition,
  VERDICTS_WORST_FIRST,
} from '../fitment/fitment.types';
import { CatalogueSnapshotService } from './catalogue-snapshot.service';
import type { PlannerOptionsDto } from './dto/planner-options.dto';
import type { PlannerOptionResponse, PlannerOptionsResponse } from './dto/planner-options.response';
import { isPolicyChargedService, isSingleKind, selectionErrors } from './quote-packages.service';

/** The option's summary: the report's verdict and deciding message, in package words. */
export function optionSummary(report: FitReport): string {
  return report.verdict === 'ok' ? 'Fits with the rest of the package.' : summaryOf(report);
}

/**
 * The roles of the current package's suggested additions that this product fills. A spring
 * rating is filled by the kit it names; hub-centric rings only by rings of the suggested sizes
 * (outer = the wheel's bore, inner = the hub, within the centre-bore check's tolerance).
 */
export function rolesFilledBy(
  product: Product,
  suggestions: readonly SuggestedAddition[],
): string[] {
  const component = componentSpecOf(product);
  const fills = (suggestion: SuggestedAddition): boolean => {
    if (suggestion.role === 'spring-rating') return suggestion.variantId === product.id;
    if (suggestion.role !== component?.role) return false;
    if (suggestion.role !== 'hub-rings') return true;
    const wanted = suggestion.numbers;
    return (
      component.ringOuterMm !== undefined &&
      component.ringInnerMm !== undefined &&
      wanted?.ringOuterMm !== undefined &&
      wanted.ringInnerMm !== undefined &&
      hubRingsMatch(
        { ringOuterMm: component.ringOuterMm, ringInnerMm: component.ringInnerMm },
        wanted.ringOuterMm,
        wanted.ringInnerMm,
      )
    );
  };
  return [...new Set(suggestions.filter(fills).map((suggestion) => suggestion.role))];
}

/**
 * The planner's choices for one step: every active product of a kind made for the vehicle, each
 * checked as the package with that product in it (in place of the selected one of a single
 * kind, or added), best verdict first, then price.
 */
@Injectable()
export class PlannerService {
  constructor(
    private readonly fitReports: FitReportsService,
    private readonly snapshots: CatalogueSnapshotService,
  ) {}

  async options(dto: PlannerOptionsDto): Promise<PlannerOptionsResponse> {
    const ids = [...new Set(dto.items.map((item) => item.productId))];
    const snapshot = await this.snapshots.current();
    const vehicle = snapshot.vehicles.get(dto.vehicleModelId) ?? null;
    const loaded = [...snapshot.products.values()].filter(
      (product) => ids.includes(product.id) || (product.kind === dto.kind && product.active),
    );
    const { ruleSet } = snapshot;
    const errors: FieldErrors = {};
    if (!vehicle) errors.vehicleModelId = ['no vehicle model has this id'];
    const products = new Map(loaded.map((product) => [product.id, product]));
    const selection = selectionErrors(vehicle, dto.items, products);
    Object.assign(errors, selection.errors);
    if (Object.keys(errors).length > 0 || !vehicle) throw new FieldErrorsException(errors);

    const selected = selection.selected.map((entry) => entry.product);
    // Where the kits' other spring ratings are found: every active kit when kits are the choice,
    // else the selected kit's own ratings (one query).
    const selectedKit = selected.find((product) => product.kind === 'suspension-kit');
    const kits =
      dto.kind === 'suspension-kit'
        ? loaded.filter((product) => product.kind === 'suspension-kit' && product.active)
        : selectedKit
          ? [...snapshot.products.values()].filter(
              (product) =>
                product.kind === 'suspension-kit' &&
                product.active &&
                product.brand === selectedKit.brand &&
                product.id !== selectedKit.id,
            )
          : [];
    const constantLoadKg = dto.constantLoadKg ?? 0;
    const current = this.fitReports.reportWith(vehicle, selected, ruleSet, kits, constantLoadKg);
    const candidates = loaded.filter(
      (product) =>
        product.kind === dto.kind &&
        product.active &&
        isMadeFor(product, vehicle.id) &&
        !isPolicyChargedService(product),
    );
    const items: PlannerOptionResponse[] = candidates.map((candidate) => {
      const others = isSingleKind(dto.kind)
        ? selected.filter((product) => product.kind !== dto.kind)
        : selected.filter((product) => product.id !== candidate.id);
      const report = this.fitReports.reportWith(
        vehicle,
        [...others, candidate],
        ruleSet,
        kits,
        constantLoadKg,
      );
      return {
        product: ProductResponse.from(candidate),
        verdict: report.verdict,
        summary: optionSummary(report),
        metrics: {
          newDiameterMm: report.metrics.newDiameterMm,
          diameterChangePercent: report.metrics.diameterChangePercent,
          speedometerAtTrue100Kmh: report.metrics.speedometerAtTrue100Kmh,
          combinedLiftMm: report.metrics.combinedLiftMm,
          trackChangeMm: report.metrics.trackChangeMm,
        },
        suggestedBy: rolesFilledBy(candidate, current.suggestedAdditions),
      };
    });
    // Best verdict first (ok before advisory ...), then the cheaper, then by name.
    const rank = (option: PlannerOptionResponse) =>
      VERDICTS_WORST_FIRST.length - 1 - VERDICTS_WORST_FIRST.indexOf(option.verdict);
    items.sort(
      (a, b) =>
        rank(a) - rank(b) ||
        a.product.priceCents - b.product.priceCents ||
        a.product.name.localeCompare(b.product.name) ||
        a.product.sku.localeCompare(b.product.sku),
    );
    return {
      items,
      suggestedAdditions: FitReportResponse.from(current).suggestedAdditions,
    };
  }
}
