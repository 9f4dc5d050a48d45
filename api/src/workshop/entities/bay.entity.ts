import { Entity, Enum, Property, Unique } from '@mikro-orm/core';
import { BAY_KINDS, type BayKind } from '../../catalogue/product-kinds';
import { BaseEntity } from '../../database/base.entity';

/**
 * A working place in the shop: a hoist, the alignment bay, a tyre bay. A bay that has had
 * bookings is switched off rather than deleted, so old reservations keep their bay.
 */
@Entity()
@Unique({ name: 'bay_name_unique', properties: ['name'] })
export class Bay extends BaseEntity<'active'> {
  @Property({ type: 'string', length: 60 })
  name: string;

  @Enum({ items: () => [...BAY_KINDS], type: 'string' })
  kind: BayKind;

  /** Order on screens and in bay choice: the first free bay of a kind is taken. */
  @Property({ type: 'smallint' })
  position: number;

  @Property({ type: 'boolean' })
  active = true;

  constructor(fields: { name: string; kind: BayKind; position: number }) {
    super();
    this.name = fields.name;
    this.kind = fields.kind;
    this.position = fields.position;
  }
}
