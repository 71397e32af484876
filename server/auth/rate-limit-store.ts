import crypto from 'node:crypto';
import type { Knex } from 'knex';
import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import { createRateLimitRepository } from '../repositories/rate-limit-repository';

const PRUNE_EVERY = 200;
/** The rate_limits.key column width. */
const KEY_COLUMN = 191;

/**
 * The stored key: as given when it fits the column, else the prefix and a
 * digest. A long e-mail must still be counted; a failed insert would let the
 * request through unlimited (passOnStoreError).
 */
function storedKey(prefix: string, key: string): string {
  const full = prefix + key;
  return full.length <= KEY_COLUMN ? full : `${prefix}sha256:${crypto.createHash('sha256').update(key).digest('hex')}`;
}

/**
 * An express-rate-limit store on MariaDB: every server process shares the
 * counts, so running more processes does not multiply the limits.
 */
export class KnexRateLimitStore implements Store {
  readonly localKeys = false;
  private windowMs = 60_000;
  private calls = 0;
  private readonly repo;

  constructor(
    knex: Knex,
    readonly prefix: string,
  ) {
    this.repo = createRateLimitRepository(knex);
  }

  init(options: Options) {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const row = await this.repo.get(storedKey(this.prefix, key));
    return row ? { totalHits: row.hits, resetTime: row.resetAt } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    if (++this.calls % PRUNE_EVERY === 0) void this.repo.prune(new Date(Date.now() - 24 * 60 * 60_000)).catch(() => undefined);
    const { hits, resetAt } = await this.repo.increment(storedKey(this.prefix, key), this.windowMs);
    return { totalHits: hits, resetTime: resetAt };
  }

  async decrement(key: string): Promise<void> {
    await this.repo.decrement(storedKey(this.prefix, key));
  }

  async resetKey(key: string): Promise<void> {
    await this.repo.reset(storedKey(this.prefix, key));
  }
}
