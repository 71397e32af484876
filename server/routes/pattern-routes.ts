import { AUTHORS } from '@/shared/roles';
import { EXPORT_TABLES, patternDrillSchema, patternFiltersSchema, type ExportTable } from '@/shared/schemas/patterns';
import type { RouteDef } from '../http/route-table';
import type { SessionUser } from '../http/access';
import type { Services } from '../services';
import { sendCsv } from '../http/csv';
import { notFound } from '../errors';

const shopOf = (req: { user?: unknown }) => (req.user as SessionUser).shopId;

/**
 * Patterns: the shop's repeat causes, comebacks and trends. Owners and leads
 * only: the figures compare technicians and jobs across the whole shop, so a
 * technician (or support) is refused with 403 rather than shown a part of them.
 */
export const patternRoutes = (s: Services): RouteDef[] => [
  {
    method: 'get',
    path: '/patterns',
    allow: AUTHORS,
    query: patternFiltersSchema,
    handler: async ({ req, query }) => s.patterns.report(shopOf(req), query),
  },
  {
    method: 'get',
    path: '/patterns/options',
    allow: AUTHORS,
    handler: async ({ req }) => s.patterns.options(shopOf(req)),
  },
  {
    method: 'get',
    path: '/patterns/walks',
    allow: AUTHORS,
    query: patternDrillSchema,
    handler: async ({ req, query }) => s.patterns.drill(shopOf(req), query),
  },
  {
    method: 'get',
    path: '/patterns/export/:table',
    allow: AUTHORS,
    query: patternFiltersSchema,
    handler: async ({ req, res, params, query }) => {
      const table = params.table.replace(/\.csv$/, '') as ExportTable;
      if (!EXPORT_TABLES.includes(table)) throw notFound(`The table "${params.table}"`);
      const out = await s.patterns.exportTable(shopOf(req), table, query);
      await sendCsv(res, out.filename, out.rows, out.columns);
      return undefined;
    },
  },
];
