import { Collection, Entity, ManyToOne, OneToMany, Property } from '@mikro-orm/core';
import { CustomerVehicle } from '../../customer-vehicles/entities/customer-vehicle.entity';
import { BaseEntity } from '../../database/base.entity';
import { User } from '../../users/entities/user.entity';
import { VehicleModel } from '../../vehicles/entities/vehicle-model.entity';
import type { VehicleUse } from '../quote-states';
import { QuoteVersion } from './quote-version.entity';

/**
 * A customer's quote: the vehicle and its use, and its versions (1, 2, ...). Each version is a
 * priced snapshot that never changes once saved; a revision adds a version.
 */
@Entity()
export class Quote extends BaseEntity<
  'customerVehicle' | 'vehicleYear' | 'uses' | 'constantLoadKg'
> {
  /** The number the customer and the desk quote (shown as Q-000123); from a sequence. */
  @Property({ type: 'integer', autoincrement: true, unique: true })
  number!: number;

  @ManyToOne(() => User, { deleteRule: 'cascade', index: true })
  customer: User;

  /** Who built it: the customer, or a desk user for a walk-in. */
  @ManyToOne(() => User, { deleteRule: 'restrict' })
  createdBy: User;

  @ManyToOne(() => VehicleModel, { deleteRule: 'restrict' })
  vehicleModel: VehicleModel;

  @ManyToOne(() => CustomerVehicle, { deleteRule: 'set null', nullable: true })
  customerVehicle: CustomerVehicle | null = null;

  @Property({ type: 'smallint', nullable: true })
  vehicleYear: number | null = null;

  @Property({ type: 'json' })
  uses: VehicleUse[] = [];

  @Property({ type: 'integer' })
  constantLoadKg: number = 0;

  @OneToMany(() => QuoteVersion, (version) => version.quote, { orderBy: { number: 'asc' } })
  versions = new Collection<QuoteVersion>(this);

  constructor(customer: User, createdBy: User, vehicleModel: VehicleModel) {
    super();
    this.customer = customer;
    this.createdBy = createdBy;
    this.vehicleModel = vehicleModel;
  }
}
