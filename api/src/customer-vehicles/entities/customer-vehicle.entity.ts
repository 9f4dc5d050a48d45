import { Entity, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';
import { User } from '../../users/entities/user.entity';
import { VehicleModel } from '../../vehicles/entities/vehicle-model.entity';

/** A customer's own vehicle: which model it is, and how they call it. */
@Entity()
export class CustomerVehicle extends BaseEntity<'nickname' | 'rego' | 'year'> {
  @ManyToOne(() => User, { deleteRule: 'cascade', index: true })
  owner: User;

  @ManyToOne(() => VehicleModel, { deleteRule: 'restrict' })
  vehicleModel: VehicleModel;

  @Property({ type: 'string', length: 60, nullable: true })
  nickname: string | null = null;

  /** Registration plate, upper case without surrounding spaces. */
  @Property({ type: 'string', length: 12, nullable: true })
  rego: string | null = null;

  /** Model year (within the model's yearFrom..yearTo). */
  @Property({ type: 'smallint', nullable: true })
  year: number | null = null;

  constructor(owner: User, vehicleModel: VehicleModel) {
    super();
    this.owner = owner;
    this.vehicleModel = vehicleModel;
  }
}
