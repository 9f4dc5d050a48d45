/**
 * Idempotent POSTs as the provider documents them ("Idempotent requests"): the status and body of
 * the first request made with a key are saved once the endpoint has begun to execute, and a retry
 * with the same key gets that saved response back (marked `Idempotent-Replayed: true`). A key
 * reused on another endpoint or with other parameters is refused with an `idempotency_error`.
 * Keys are kept for 24 hours. Request handling after the body is read is synchronous, so two
 * requests with one key can never execute at the same time: the second always finds the first
 * one's saved response.
 */
import { ApiError } from './errors';
import type { SavedResponse, Store } from './store';

export const IDEMPOTENCY_TTL_MS = 24 * 60 * 60 * 1000;
const MAX_KEY_LENGTH = 255;

export type Lookup =
  { kind: 'new' } | { kind: 'replay'; saved: SavedResponse } | { kind: 'refused'; error: ApiError };

export class IdempotencyKeys {
  constructor(
    private readonly store: Store,
    private readonly now: () => number,
  ) {}

  private get saved(): Record<string, SavedResponse> {
    return this.store.state.idempotency;
  }

  /** Forgets keys older than 24 hours. */
  prune(): void {
    const cutoff = this.now() - IDEMPOTENCY_TTL_MS;
    let changed = false;
    for (const [key, saved] of Object.entries(this.saved)) {
      if (saved.savedAt <= cutoff) {
        delete this.saved[key];
        changed = true;
      }
    }
    if (changed) this.store.save();
  }

  lookup(key: string, method: string, path: string, params: string): Lookup {
    if (key.length > MAX_KEY_LENGTH) {
      return {
        kind: 'refused',
        error: new ApiError(
          400,
          {
            type: 'invalid_request_error',
            message: `Invalid Idempotency-Key: keys can be at most ${MAX_KEY_LENGTH} characters long.`,
          },
          false,
        ),
      };
    }
    this.prune();
    const saved = Object.hasOwn(this.saved, key) ? this.saved[key] : undefined;
    if (!saved) return { kind: 'new' };
    if (saved.method !== method || saved.path !== path) {
      return {
        kind: 'refused',
        error: new ApiError(
          400,
          {
            type: 'idempotency_error',
            message: `Keys for idempotent requests can only be used for the same endpoint they were first used for ('${saved.method} ${saved.path}' vs '${method} ${path}'). Try using a key other than '${key}' if you meant to execute a different request.`,
          },
          false,
        ),
      };
    }
    if (saved.params !== params) {
      return {
        kind: 'refused',
        error: new ApiError(
          400,
          {
            type: 'idempotency_error',
            message: `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`,
          },
          false,
        ),
      };
    }
    return { kind: 'replay', saved };
  }

  save(entry: Omit<SavedResponse, 'savedAt'>): void {
    this.saved[entry.key] = { ...entry, savedAt: this.now() };
    this.store.save();
  }
}
