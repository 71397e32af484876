import type { TreeSummary } from '@/shared/schemas/trees';
import type { InstallType } from '@/trees/tree-format';
import { groupBySymptom, type SymptomGroup } from '@/components/trees/group-trees';

/** Walkable trees split into those matching the job's install (suggested) and the rest by symptom. */
export function treesForJob(trees: readonly TreeSummary[], install: readonly InstallType[]): { suggested: TreeSummary[]; bySymptom: SymptomGroup[] } {
  const walkable = trees.filter((t) => t.status === 'active' && t.publishedVersion !== null);
  const wanted = new Set(install);
  const matches = (t: TreeSummary) => t.installTypes.filter((i) => wanted.has(i) && i !== 'other').length;
  const suggested = walkable.filter((t) => matches(t) > 0).sort((a, b) => matches(b) - matches(a) || a.title.localeCompare(b.title));
  return { suggested, bySymptom: groupBySymptom(walkable.filter((t) => !suggested.includes(t))) };
}
