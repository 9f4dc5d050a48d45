import type { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { User } from '../users/entities/user.entity';
import type { QuoteVersion } from './entities/quote-version.entity';
import type { Quote } from './entities/quote.entity';

/** A version was accepted: passed to every handler inside the accepting transaction. */
export interface QuoteAcceptedEvent {
  em: EntityManager;
  quote: Quote;
  version: QuoteVersion;
  actor: User;
  now: Date;
}

export type QuoteAcceptedHandler = (event: QuoteAcceptedEvent) => Promise<void>;

/**
 * What else changes when a customer accepts a version (a booking on an earlier version is
 * re-planned for it). Modules that depend on quotes register here, so quotes need not depend on
 * them; every handler runs in the accepting transaction, in order, and a handler's error rolls
 * the acceptance back.
 */
@Injectable()
export class QuoteAcceptanceHooks {
  private readonly handlers: QuoteAcceptedHandler[] = [];

  register(handler: QuoteAcceptedHandler): void {
    this.handlers.push(handler);
  }

  async run(event: QuoteAcceptedEvent): Promise<void> {
    for (const handler of this.handlers) await handler(event);
  }
}
