/**
 * Field-level messages for the step form and tree details, from the same zod
 * schemas the server and the validator use (trees/tree-format.ts).
 */
import { z } from 'zod';
import { fieldMessages } from '@/components/forms/field-errors';
import { INSTALL_TYPES, SYMPTOMS, stepMetaSchema, type StateDef, type TreeDoc } from '@/trees/tree-format';
import type { Finding } from '@/trees/engine-types';

/** Path ("title", "cause.code", "cautions.0.text") → message for one step's fields. */
export function stepFieldErrors(state: StateDef | undefined): Record<string, string> {
  if (!state) return {};
  const parsed = stepMetaSchema.safeParse(state.meta);
  return parsed.success ? {} : fieldMessages(parsed.error);
}

const treeFactsSchema = z.object({
  title: z.string().min(1, 'Give the tree a title.').max(140, 'Keep the title under 140 characters.'),
  symptom: z.enum(SYMPTOMS, { message: 'Choose the symptom.' }),
  installTypes: z.array(z.enum(INSTALL_TYPES)).min(1, 'Choose at least one install type.'),
  summary: z.string().max(1000, 'Keep the summary under 1000 characters.'),
});

/** Messages for the tree's own fields (title, symptom, install types, summary). */
export function treeFieldErrors(doc: TreeDoc): Record<string, string> {
  const parsed = treeFactsSchema.safeParse({ title: doc.title, symptom: doc.symptom, installTypes: doc.installTypes, summary: doc.summary ?? '' });
  return parsed.success ? {} : fieldMessages(parsed.error);
}

/** Findings grouped by step id ('' for the tree itself). */
export function findingsByStep(findings: Finding[]): Map<string, Finding[]> {
  const out = new Map<string, Finding[]>();
  for (const f of findings) {
    const key = f.stepId ?? '';
    out.set(key, [...(out.get(key) ?? []), f]);
  }
  return out;
}
