import { IsolationLevel } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/postgresql';
import { Inject, Injectable, InternalServerErrorException } from '@nestjs/common';
import type { Pool } from 'pg';
import { Product } from '../catalogue/entities/product.entity';
import { CustomerVehicle } from '../customer-vehicles/entities/customer-vehicle.entity';
import { PG_POOL } from '../database/pg-pool.module';
import { type RuleSetLimits, validateRuleSetLimits } from '../fitment/rule-set-limits';
import { RuleSet } from '../rule-sets/entities/rule-set.entity';
import { VehicleModel } from '../vehicles/entities/vehicle-model.entity';
import { Workshop } from '../workshop/entities/workshop.entity';
import type { PackageData } from './package-data.loader';

const ignore = (): void => undefined;

/** A read-only copy of what a preview reads, as of one catalogue revision. */
export interface CatalogueSnapshot {
  revision: string;
  vehicles: ReadonlyMap<string, VehicleModel>;
  /** Every product, switched on or off, with fitsVehicleModels loaded. */
  products: ReadonlyMap<string, Product>;
  ruleSet: RuleSetLimits;
  workshop: Workshop;
}

/**
 * Keeps the catalogue, the vehicle models, the default rule set and the workshop policy of the
 * latest revision in memory for the routes that only compute (the price preview and the planner
 * options). Before each use it reads the revision (one row, raised by triggers on every write to
 * those tables, from any process) and reloads when it moved, so an answer never uses data older
 * than the request. The entities are detached copies: they are read, never changed or saved.
 * Saving a quote does not use them (it reads inside its own transaction).
 */
@Injectable()
export class CatalogueSnapshotService {
  private snapshot: CatalogueSnapshot | null = null;
  private loading: Promise<CatalogueSnapshot> | null = null;
  private revisionRead: Promise<string> | null = null;
  private nextRevisionRead: Promise<string> | null = null;

  constructor(
    private readonly em: EntityManager,
    @Inject(PG_POOL) private readonly pool: Pool,
  ) {}

  async current(): Promise<CatalogueSnapshot> {
    const revision = await this.revisionNow();
    if (this.snapshot?.revision === revision) return this.snapshot;
    // One reload at a time; requests that arrive meanwhile wait for it.
    this.loading ??= this.load().finally(() => {
      this.loading = null;
    });
    const loaded = await this.loading;
    // A write may have landed while loading: the snapshot is at least as new as `revision`.
    return loaded;
  }

  /**
   * The revision as of a moment after the caller asked. Callers share reads: one that asks while
   * a read is in flight (sent, perhaps, before it asked) waits for the next read, which starts
   * when that one ends, so no answer rests on a read older than its request. Under load that is
   * one query for a handful of previews instead of one each.
   */
  revisionNow(): Promise<string> {
    if (!this.revisionRead) return this.startRevisionRead();
    this.nextRevisionRead ??= this.revisionRead.then(ignore, ignore).then(() => {
      this.nextRevisionRead = null;
      return this.startRevisionRead();
    });
    return this.nextRevisionRead;
  }

  private startRevisionRead(): Promise<string> {
    const read = this.readRevision().finally(() => {
      if (this.revisionRead === read) this.revisionRead = null;
    });
    this.revisionRead = read;
    return read;
  }

  private async readRevision(): Promise<string> {
    // A named (prepared) statement: parsed once per connection.
    const result = await this.pool.query<{ revision: string }>({
      name: 'catalogue-revision',
      text: 'select "revision" from "catalogue_revision" where "id" = 1',
    });
    const revision = result.rows[0]?.revision;
    if (revision === undefined) {
      throw new InternalServerErrorException(
        'The catalogue revision row is missing: run the migrations',
      );
    }
    return revision;
  }

  /** What `QuotePackagesService` needs for one package, from the snapshot. */
  async packageData(
    vehicleModelId: string,
    productIds: readonly string[],
    customerVehicleId?: string,
  ): Promise<PackageData> {
    const snapshot = await this.current();
    const products = productIds
      .map((id) => snapshot.products.get(id))
      .filter((product): product is Product => product !== undefined);
    const kitBrands = new Set(
      products.filter((product) => product.kind === 'suspension-kit').map((kit) => kit.brand),
    );
    const brandKits =
      kitBrands.size === 0
        ? []
        : [...snapshot.products.values()].filter(
            (product) =>
              product.kind === 'suspension-kit' &&
              product.active &&
              kitBrands.has(product.brand) &&
              !productIds.includes(product.id),
          );
    return {
      vehicle: snapshot.vehicles.get(vehicleModelId) ?? null,
      // Customer vehicles change with every customer: read, never kept.
      customerVehicle: customerVehicleId
        ? await this.em.findOne(CustomerVehicle, { id: customerVehicleId })
        : null,
      products,
      brandKits,
      ruleSet: snapshot.ruleSet,
      workshop: snapshot.workshop,
    };
  }

  private async load(): Promise<CatalogueSnapshot> {
    const fork = this.em.fork({ clear: true });
    const snapshot = await fork.transactional(
      async (em) => {
        // The revision read in the same snapshot of the database as the rows.
        const [{ revision }] = await em.execute<{ revision: string }[]>(
          'select "revision"::text as "revision" from "catalogue_revision" where "id" = 1',
        );
        const [vehicles, products, ruleSet, workshops] = [
          await em.find(VehicleModel, {}),
          await em.find(Product, {}, { populate: ['fitsVehicleModels:ref'] }),
          await em.findOne(RuleSet, { isDefault: true }),
          await em.find(Workshop, {}, { orderBy: { createdAt: 'asc', id: 'asc' }, limit: 1 }),
        ];
        if (!ruleSet) throw new InternalServerErrorException('No default rule set is stored');
        const validation = validateRuleSetLimits(ruleSet.toEngineCandidate());
        if (!validation.ok) {
          throw new InternalServerErrorException(`Rule set "${ruleSet.name}" is not valid`);
        }
        const [workshop] = workshops;
        if (!workshop) {
          throw new InternalServerErrorException(
            'The workshop is not set up: run the database seed first',
          );
        }
        return {
          revision,
          vehicles: new Map(vehicles.map((vehicle) => [vehicle.id, vehicle])),
          products: new Map(products.map((product) => [product.id, product])),
          ruleSet: validation.ruleSet,
          workshop,
        };
      },
      { isolationLevel: IsolationLevel.REPEATABLE_READ, readOnly: true },
    );
    this.snapshot = snapshot;
    return snapshot;
  }
}
