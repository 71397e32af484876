/** Row-to-answer pieces shared by reading the tree library and authoring it. */
import type { TreeVersionInfo } from '@/shared/schemas/trees';
import type { TreeVersionRow } from '../repositories/tree-repository';

/** A database time as ISO text; null stays null. */
export const iso = (d: Date | string | null | undefined) => (d ? new Date(d).toISOString() : null);

/** A JSON column's value: MariaDB hands JSON back as text, other drivers as the value itself. */
export const parsed = <T>(v: unknown): T => (typeof v === 'string' ? JSON.parse(v) : v) as T;

/** A version as the tree page and the history list it; stock versions are credited to the library. */
export function toVersionInfo(row: Omit<TreeVersionRow, 'doc'>): TreeVersionInfo {
  return {
    id: row.id,
    version: row.version,
    state: row.state,
    source: row.source,
    authorName: row.author_name ?? (row.source === 'stock' ? 'Baywalk stock library' : null),
    note: row.note,
    createdAt: iso(row.created_at)!,
    publishedAt: iso(row.published_at),
  };
}
