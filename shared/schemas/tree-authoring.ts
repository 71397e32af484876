/**
 * Request and answer shapes of tree authoring: new trees, drafts (saved with
 * the tree's revision number for optimistic locking), publish, retire,
 * import/export, version history with differences, and step statistics.
 */
import { z } from 'zod';
import { INSTALL_TYPES, SYMPTOMS } from '@/trees/tree-format';
import { treeFindingSchema, treeVersionSchema } from './trees';

/** Tree ids (the document's `id`): lower-case words joined by hyphens. */
export const treeSlugSchema = z
  .string()
  .trim()
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'Use lower-case letters, digits and hyphens, like "lean-after-intake".')
  .max(64, 'Keep the id under 64 characters.');

/** POST /api/trees: a new tree, opened as a draft. */
export const treeCreateSchema = z.object({
  title: z.string().trim().min(3, 'Give the tree a title of a few words.').max(140, 'Keep the title under 140 characters.'),
  symptom: z.enum(SYMPTOMS, { message: 'Choose the symptom the tree starts from.' }),
  installTypes: z.array(z.enum(INSTALL_TYPES, { message: 'Choose install types from the list.' })).min(1, 'Choose at least one install type.'),
  summary: z.string().trim().max(1000, 'Keep the summary under 1000 characters.').default(''),
  /** Optional: made from the title when left out. */
  slug: treeSlugSchema.optional(),
});
export type TreeCreate = z.input<typeof treeCreateSchema>;

const revision = z.number({ message: 'Send the revision number you loaded the draft with.' }).int().positive();

/** PUT /api/trees/:id/draft. The document may still have problems: drafts are work in progress. */
export const draftSaveSchema = z.object({
  revision,
  doc: z.record(z.string(), z.unknown(), { message: 'Send the tree document as a JSON object.' }),
  note: z.string().trim().max(500, 'Keep the note under 500 characters.').optional(),
});
export type DraftSave = z.input<typeof draftSaveSchema>;

/** POST /api/trees/:id/publish. */
export const publishSchema = z.object({
  revision,
  note: z.string().trim().min(3, 'Say in a few words what changed in this version.').max(500, 'Keep the note under 500 characters.'),
  /** The author has read the validator's warnings and publishes anyway. */
  acceptWarnings: z.boolean().default(false),
});
export type PublishInput = z.input<typeof publishSchema>;

/** DELETE /api/trees/:id/draft?revision=N (the revision is optional: discarding is its own confirmation). */
export const discardQuerySchema = z.object({ revision: z.coerce.number().int().positive().optional() });

/** POST /api/trees/import: the text of a Baywalk tree file. */
export const treeImportSchema = z.object({
  text: z.string({ message: 'Choose a tree file to import.' }).min(2, 'The file is empty.').max(240_000, 'The file is too large for a tree (over 240 kB).'),
  fileName: z.string().max(200).optional(),
});
export type TreeImport = z.input<typeof treeImportSchema>;

/** GET /api/trees/:id/diff?from=<versionId>&to=<versionId>. */
export const diffQuerySchema = z.object({
  from: z.coerce.number({ message: 'Choose the older version.' }).int().positive('Choose the older version.'),
  to: z.coerce.number({ message: 'Choose the newer version.' }).int().positive('Choose the newer version.'),
});

/** GET /api/trees/:id/export?version=<number>: the published version when left out. */
export const exportQuerySchema = z.object({ version: z.coerce.number().int().positive('Give a version number.').optional() });

/** GET /api/trees/:id/stats?version=<versionId>: every version when left out. */
export const statsQuerySchema = z.object({ version: z.coerce.number().int().positive('Give a version id.').optional() });

const person = z.object({ id: z.number(), name: z.string() }).nullable();

/** The tree's draft as the editor loads it. */
export const draftSchema = z.object({
  treeId: z.number(),
  slug: z.string(),
  versionId: z.number(),
  version: z.number(),
  /** The tree's revision: send it back with the next save. */
  revision: z.number(),
  /** The document as last saved (may not pass the checks yet). */
  doc: z.record(z.string(), z.unknown()),
  note: z.string(),
  /** The published version number this draft will replace, if any. */
  publishedVersion: z.number().nullable(),
  author: person,
  updatedBy: person,
  createdAt: z.string(),
  updatedAt: z.string(),
  findings: z.array(treeFindingSchema),
});
export type Draft = z.infer<typeof draftSchema>;

/** Answer to a save: the new revision and what the checks make of the saved document. */
export const draftSavedSchema = z.object({
  revision: z.number(),
  updatedAt: z.string(),
  findings: z.array(treeFindingSchema),
});
export type DraftSaved = z.infer<typeof draftSavedSchema>;

export const publishedSchema = z.object({ treeId: z.number(), versionId: z.number(), version: z.number(), revision: z.number() });
export type Published = z.infer<typeof publishedSchema>;

export const treeStatusAnswerSchema = z.object({ treeId: z.number(), status: z.enum(['active', 'retired']), revision: z.number() });

export const importedSchema = z.object({
  treeId: z.number(),
  /** True when the file made a new tree; false when it became a new draft of a tree already in the library. */
  created: z.boolean(),
  version: z.number(),
  warnings: z.array(treeFindingSchema),
});
export type Imported = z.infer<typeof importedSchema>;

export const retiredTreesSchema = z.object({
  trees: z.array(z.object({ id: z.number(), title: z.string(), symptom: z.enum(SYMPTOMS), publishedVersion: z.number().nullable(), updatedAt: z.string() })),
});
export type RetiredTrees = z.infer<typeof retiredTreesSchema>;

/** GET /api/trees/:id/versions/:versionId. */
export const versionDocSchema = z.object({ version: treeVersionSchema, doc: z.record(z.string(), z.unknown()) });
export type VersionDoc = z.infer<typeof versionDocSchema>;

const lineChange = z.object({ op: z.enum(['same', 'added', 'removed']), text: z.string() });
const fieldChange = z.object({ field: z.string(), label: z.string(), before: z.string(), after: z.string(), lines: z.array(lineChange) });

/** GET /api/trees/:id/diff: step by step from one version to another. */
export const versionDiffSchema = z.object({
  from: treeVersionSchema,
  to: treeVersionSchema,
  tree: z.array(fieldChange),
  steps: z.array(
    z.object({
      stepId: z.string(),
      change: z.enum(['added', 'removed', 'changed']),
      kind: z.string(),
      title: z.string(),
      fields: z.array(fieldChange),
    }),
  ),
  unchanged: z.number(),
});
export type VersionDiff = z.infer<typeof versionDiffSchema>;

/** GET /api/trees/:id/stats: what finished walks did with the tree. */
export const treeStatsSchema = z.object({
  walks: z.object({
    /** Every walk of the tree (in the chosen version), open or finished. */
    total: z.number(),
    finished: z.number(),
    open: z.number(),
    /** Finished walks that reached a cause step. */
    toCause: z.number(),
    /** Finished walks that ended at a refer step. */
    toRefer: z.number(),
    /** Finished walks closed before reaching a cause or refer step. */
    unfinished: z.number(),
  }),
  /** Over walks that reached a cause step. */
  toCause: z.object({ medianSteps: z.number().nullable(), medianMinutes: z.number().nullable() }),
  causes: z.array(
    z.object({ stepId: z.string(), code: z.string(), title: z.string(), count: z.number(), medianSteps: z.number().nullable(), medianMinutes: z.number().nullable() }),
  ),
  steps: z.array(
    z.object({
      stepId: z.string(),
      title: z.string(),
      kind: z.string(),
      /** Answers recorded at this step (answers later undone do not count). */
      total: z.number(),
      options: z.array(z.object({ key: z.string(), label: z.string(), target: z.string().nullable(), count: z.number() })),
    }),
  ),
});
export type TreeStatsAnswer = z.infer<typeof treeStatsSchema>;
