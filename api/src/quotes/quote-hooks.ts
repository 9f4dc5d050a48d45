import type { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { User } from '../users/entities/user.entity';
import type { QuoteVersion } from './entities/quote-version.entity';
import type { Quote } from './entities/quote.entity';

/** A version was accepted or declined by the customer (inside that transaction). */
export interface QuoteAnsweredEvent {
  em: EntityManager;
  quote: Quote;
  version: QuoteVersion;
  actor: User;
  now: Date;
}

/** The desk saved a revision (inside that transaction): the new version and the one before. */
export interface QuoteRevisedEvent extends QuoteAnsweredEvent {
  previous: QuoteVersion;
}

type Handler<E> = (event: E) => Promise<void>;

/**
 * What else changes when a quote moves on: a booking on an earlier version is re-planned for an
 * accepted one, and its audit trail notes a revision sent or declined. Modules that depend on
 * quotes register here, so quotes need not depend on them; every handler runs in the quote's own
 * transaction, in order, and a handler's error rolls the change back.
 */
@Injectable()
export class QuoteHooks {
  private readonly accepted: Handler<QuoteAnsweredEvent>[] = [];
  private readonly declined: Handler<QuoteAnsweredEvent>[] = [];
  private readonly revised: Handler<QuoteRevisedEvent>[] = [];

  onAccepted(handler: Handler<QuoteAnsweredEvent>): void {
    this.accepted.push(handler);
  }

  onDeclined(handler: Handler<QuoteAnsweredEvent>): void {
    this.declined.push(handler);
  }

  onRevised(handler: Handler<QuoteRevisedEvent>): void {
    this.revised.push(handler);
  }

  async runAccepted(event: QuoteAnsweredEvent): Promise<void> {
    for (const handler of this.accepted) await handler(event);
  }

  async runDeclined(event: QuoteAnsweredEvent): Promise<void> {
    for (const handler of this.declined) await handler(event);
  }

  async runRevised(event: QuoteRevisedEvent): Promise<void> {
    for (const handler of this.revised) await handler(event);
  }
}
