/// <reference types="node" />
/**
 * Fills a shop's library from the stock trees shipped in trees/library/.
 * Idempotent: a tree the shop already has is left alone, unless it is still
 * exactly the stock copy and the shipped library changed, in which case the
 * new document becomes a new published version (old versions stay for walks).
 */
import fs from 'node:fs';
import path from 'node:path';
import type { Knex } from 'knex';
import { parseTree } from '@/trees/engine';
import type { TreeDoc } from '@/trees/tree-format';
import { createTreeRepository } from '../repositories/tree-repository';
import { translateError } from '../errors';

const STOCK_DIR = path.resolve(__dirname, '../../trees/library');

export interface StockLibrary {
  trees: Array<{ file: string; doc: TreeDoc }>;
  /** Files that are not valid trees, with why (the library tests catch these before shipping). */
  rejected: Array<{ file: string; problems: string[] }>;
}

/** Reads and validates every stock tree document. */
export function loadStockLibrary(dir = STOCK_DIR): StockLibrary {
  const out: StockLibrary = { trees: [], rejected: [] };
  if (!fs.existsSync(dir)) return out;
  for (const file of fs.readdirSync(dir).filter((f) => f.endsWith('.json')).sort()) {
    let json: unknown;
    try {
      json = JSON.parse(fs.readFileSync(path.join(dir, file), 'utf8'));
    } catch (err) {
      out.rejected.push({ file, problems: [`not valid JSON: ${(err as Error).message}`] });
      continue;
    }
    const parsed = parseTree(json);
    if (parsed.ok) out.trees.push({ file, doc: parsed.doc });
    else out.rejected.push({ file, problems: parsed.findings.map((f) => f.message) });
  }
  return out;
}

export interface StockInstallReport {
  added: string[];
  updated: string[];
  rejected: StockLibrary['rejected'];
}

/** Gives a shop every stock tree it does not have yet; safe to call on every start and at sign-up. */
export async function installStockTrees(knex: Knex, shopId: number, library: StockLibrary = loadStockLibrary()): Promise<StockInstallReport> {
  const repo = createTreeRepository(knex);
  const report: StockInstallReport = { added: [], updated: [], rejected: library.rejected };
  for (const { doc } of library.trees) {
    const facts = { title: doc.title, symptom: doc.symptom, summary: doc.summary, install_types: [...doc.installTypes] };
    try {
      await knex.transaction(async (trx) => {
        const existing = await repo.findBySlug(shopId, doc.id, trx);
        if (!existing) {
          const treeId = await repo.insertTree({ shop_id: shopId, slug: doc.id, status: 'active', source: 'stock', created_by: null, ...facts }, trx);
          const versionId = await repo.insertVersion(stockVersion(shopId, treeId, 1, doc, 'From the Baywalk stock library.'), trx);
          await repo.publish(shopId, treeId, versionId, facts, trx);
          report.added.push(doc.id);
          return;
        }
        if (existing.source !== 'stock' || existing.status !== 'active') return;
        const current = await repo.findPublished(shopId, existing, trx);
        if (current && (current.source !== 'stock' || canonical(current.doc) === canonical(doc))) return;
        if (await repo.hasShopVersions(shopId, existing.id, trx)) return; // the shop has its own edits: leave them be
        const n = await repo.nextVersionNumber(shopId, existing.id, trx);
        const versionId = await repo.insertVersion(stockVersion(shopId, existing.id, n, doc, 'Updated from the Baywalk stock library.'), trx);
        await repo.publish(shopId, existing.id, versionId, facts, trx);
        report.updated.push(doc.id);
      });
    } catch (err) {
      // Two servers starting at once may race to add the same tree; the unique key keeps one.
      if (translateError(err)?.status === 409) continue;
      throw err;
    }
  }
  return report;
}

/** Runs installStockTrees for every shop (start-up, for shops made before a tree shipped). */
export async function installStockTreesInAllShops(knex: Knex): Promise<StockInstallReport[]> {
  const library = loadStockLibrary();
  const reports: StockInstallReport[] = [];
  for (const shopId of await createTreeRepository(knex).allShopIds()) reports.push(await installStockTrees(knex, shopId, library));
  return reports;
}

function stockVersion(shopId: number, treeId: number, version: number, doc: TreeDoc, note: string) {
  return { shop_id: shopId, tree_id: treeId, version, state: 'draft' as const, doc, source: 'stock' as const, author_id: null, note, published_at: null };
}

/** JSON with object keys sorted, so two equal documents compare equal whatever the key order. */
function canonical(value: unknown): string {
  return JSON.stringify(value, (_k, v) =>
    v && typeof v === 'object' && !Array.isArray(v) ? Object.fromEntries(Object.entries(v).sort(([a], [b]) => a.localeCompare(b))) : v,
  );
}
