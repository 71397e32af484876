import type { Knex } from 'knex';

/**
 * A count of the writes this process made to a database's trees and tree
 * versions. Readers that keep tree pages for a moment put it in their keys,
 * so a publish, retire or draft save made here is seen on the very next
 * read. Every write method of the tree repositories moves it on.
 */
// Keyed by the pool's settings object, which a transaction shares with the handle it came from.
const counts = new WeakMap<object, number>();
const keyOf = (knex: Knex): object => knex.client.config;

export function treeWrites(knex: Knex): number {
  return counts.get(keyOf(knex)) ?? 0;
}

/** Called by a write on `knex` (the repository's handle), made through `db` (that handle or a transaction of it). */
export function treesChanged(knex: Knex, db: Knex): void {
  const bump = () => counts.set(keyOf(knex), treeWrites(knex) + 1);
  bump();
  // Inside a transaction the write shows at commit: move on again then, so nothing read meanwhile outlives it.
  const settled = (db as { executionPromise?: Promise<unknown> }).executionPromise;
  settled?.then(bump, bump);
}
