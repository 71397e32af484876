/**
 * Shared pieces of tree authoring: turning rows into answers, the document a
 * new tree starts from, and the refusal that names the steps at fault.
 */
import type { Finding } from '@/trees/engine-types';
import { TREE_FORMAT, type InstallType, type Symptom } from '@/trees/tree-format';
import type { Draft } from '@/shared/schemas/tree-authoring';
import type { TreeVersionInfo } from '@/shared/schemas/trees';
import type { AuthoredVersionRow } from '../repositories/tree-draft-repository';
import { AppError } from '../errors';
import { iso, parsed, toVersionInfo } from './tree-rows';

const person = (id: number | null, name: string | null | undefined) => (id ? { id, name: name ?? 'Former staff' } : null);

/** A version as the history lists it. */
export function versionInfo(row: Omit<AuthoredVersionRow, 'doc'>): TreeVersionInfo & { publishedBy: string | null; updatedBy: string | null; updatedAt: string | null } {
  return {
    ...toVersionInfo(row),
    publishedBy: row.published_by_name ?? null,
    updatedBy: row.updated_by_name ?? null,
    updatedAt: iso(row.updated_at),
  };
}

/** A draft as the editor loads it. */
export function toDraft(row: AuthoredVersionRow, tree: { id: number; slug: string; revision: number }, publishedVersion: number | null, findings: Finding[]): Draft {
  return {
    treeId: tree.id,
    slug: tree.slug,
    versionId: row.id,
    version: row.version,
    revision: tree.revision,
    doc: parsed<Record<string, unknown>>(row.doc),
    note: row.note,
    publishedVersion,
    author: person(row.author_id, row.author_name),
    updatedBy: person(row.updated_by, row.updated_by_name),
    createdAt: iso(row.created_at)!,
    updatedAt: iso(row.updated_at ?? row.created_at)!,
    findings,
  };
}

/** The document a brand-new tree starts from: one question still to be written. */
export function starterDoc(slug: string, facts: { title: string; symptom: Symptom; installTypes: InstallType[]; summary: string }) {
  return {
    format: TREE_FORMAT,
    id: slug,
    title: facts.title,
    symptom: facts.symptom,
    installTypes: facts.installTypes,
    summary: facts.summary,
    machine: {
      id: slug,
      initial: 'first-check',
      states: {
        'first-check': { meta: { kind: 'ask', title: 'First check', body: '', cautions: [], photoPrompts: [] }, on: {} },
      },
    },
  };
}

/** A tree id made from a title: "Lean codes after an intake" → "lean-codes-after-an-intake". */
export function slugFrom(title: string): string {
  const slug = title
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 56)
    .replace(/-+$/, '');
  return slug || 'tree';
}

/** Names the steps a list of findings is about, for a sentence: `"a", "b" and the tree itself`. */
export function stepNames(findings: Finding[]): string[] {
  const names: string[] = [];
  for (const f of findings) {
    const name = f.stepId ? `"${f.stepId}"` : 'the tree itself';
    if (!names.includes(name)) names.push(name);
  }
  return names;
}

const joinWords = (words: string[]) => (words.length <= 1 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words.at(-1)}`);

/** 422 for a draft whose checks still find errors, naming every step at fault. */
export function draftHasErrors(errors: Finding[]): AppError {
  const where = stepNames(errors);
  const steps = [...new Set(errors.flatMap((f) => (f.stepId ? [f.stepId] : [])))];
  const n = errors.length;
  return new AppError(
    422,
    'draft_has_errors',
    `This draft cannot be published until ${n === 1 ? 'one problem is' : `${n} problems are`} fixed, in ${where.length === 1 ? 'step' : 'steps'} ${joinWords(where)}.`.replace('step the tree itself', 'the tree itself'),
    { findings: errors, steps },
  );
}

/** 400 for an import whose file does not pass the checks; nothing is saved. */
export function importRefused(errors: Finding[]): AppError {
  const where = stepNames(errors);
  const n = errors.length;
  return new AppError(
    400,
    'import_invalid',
    `Nothing was imported: the file has ${n === 1 ? 'one problem' : `${n} problems`}${where.length ? `, in ${joinWords(where)}` : ''}. First: ${errors[0].message}`,
    { findings: errors },
  );
}
