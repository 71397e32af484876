/** Request and answer shapes of the trees API (GET /api/trees, GET /api/trees/:id). */
import { z } from 'zod';
import { HAZARDS, INSTALL_TYPES, STEP_KINDS, SYMPTOMS, treeDocSchema } from '@/trees/tree-format';

/** Query of GET /api/trees: every filter optional. */
export const treeListQuerySchema = z.object({
  symptom: z.enum(SYMPTOMS, { message: `Choose a symptom from the list (${SYMPTOMS.join(', ')}).` }).optional(),
  installType: z.enum(INSTALL_TYPES, { message: `Choose an install type from the list (${INSTALL_TYPES.join(', ')}).` }).optional(),
  q: z.string().trim().max(100, 'Keep the search under 100 characters.').optional(),
});
export type TreeListQuery = z.infer<typeof treeListQuerySchema>;

export const treeSummarySchema = z.object({
  id: z.number().int(),
  slug: z.string(),
  title: z.string(),
  symptom: z.enum(SYMPTOMS),
  installTypes: z.array(z.enum(INSTALL_TYPES)),
  summary: z.string(),
  status: z.enum(['active', 'retired']),
  source: z.enum(['stock', 'shop']),
  /** Version number of the published version, or null when none is published yet. */
  publishedVersion: z.number().int().nullable(),
  /** Steps in the published version. */
  steps: z.number().int().nullable(),
  updatedAt: z.string(),
});
export type TreeSummary = z.infer<typeof treeSummarySchema>;

export const treeListSchema = z.object({ trees: z.array(treeSummarySchema) });
export type TreeList = z.infer<typeof treeListSchema>;

export const treeVersionSchema = z.object({
  id: z.number().int(),
  version: z.number().int(),
  state: z.enum(['draft', 'published', 'retired']),
  source: z.enum(['stock', 'shop']),
  authorName: z.string().nullable(),
  note: z.string(),
  createdAt: z.string(),
  publishedAt: z.string().nullable(),
});
export type TreeVersionInfo = z.infer<typeof treeVersionSchema>;

/** A step as the tree page lists it, in the order a walk meets them. */
export const treeStepSchema = z.object({
  id: z.string(),
  kind: z.enum(STEP_KINDS),
  title: z.string(),
  cautions: z.array(z.object({ hazard: z.enum(HAZARDS), text: z.string() })),
  /** Fewest answers from the start to this step. */
  depth: z.number().int(),
  /** Answers still needed from here to the nearest cause, or null. */
  toCause: z.number().int().nullable(),
});

export const treeCauseSchema = z.object({
  stepId: z.string(),
  code: z.string(),
  title: z.string(),
  area: z.string(),
  fix: z.string(),
  /** Fewest answers from the start to this cause. */
  shortest: z.number().int(),
});

export const treeReferSchema = z.object({ stepId: z.string(), title: z.string(), to: z.string(), reason: z.string() });

export const treeFindingSchema = z.object({
  severity: z.enum(['error', 'warning']),
  stepId: z.string().optional(),
  code: z.string(),
  message: z.string(),
});

/** GET /api/trees/:id: the tree, its published version with the document, and what the validator makes of it. */
export const treeDetailSchema = z.object({
  tree: treeSummarySchema,
  version: treeVersionSchema.extend({ doc: treeDocSchema }).nullable(),
  versions: z.array(treeVersionSchema),
  stats: z.object({ steps: z.number().int(), shortestToCause: z.record(z.string(), z.number().int()), longestPath: z.number().int() }).nullable(),
  findings: z.array(treeFindingSchema),
  steps: z.array(treeStepSchema),
  causes: z.array(treeCauseSchema),
  refers: z.array(treeReferSchema),
});
export type TreeDetail = z.infer<typeof treeDetailSchema>;
export type TreeStep = z.infer<typeof treeStepSchema>;
export type TreeCause = z.infer<typeof treeCauseSchema>;
