import { Entity, PrimaryKey, Property } from '@mikro-orm/core';

/**
 * An event of the payment provider that has been handled. The provider delivers an event at
 * least once, perhaps many times: its id is recorded in the transaction that handles it, so a
 * repeat finds it here and changes nothing.
 */
@Entity()
export class ProcessedWebhookEvent {
  /** The provider's event id (evt_…). */
  @PrimaryKey({ type: 'string', length: 255 })
  eventId: string;

  @Property({ type: 'string', length: 100 })
  type: string;

  @Property({ type: 'datetime', columnType: 'timestamptz' })
  receivedAt: Date;

  constructor(eventId: string, type: string, receivedAt: Date) {
    this.eventId = eventId;
    this.type = type;
    this.receivedAt = receivedAt;
  }
}
