import type { TreeSummary } from '@/shared/schemas/trees';
import { SYMPTOMS, SYMPTOM_LABELS, type Symptom } from '@/trees/tree-format';

export interface SymptomGroup {
  symptom: Symptom;
  label: string;
  trees: TreeSummary[];
}

/** Trees grouped by symptom, in the product's symptom order, trees by title; empty groups left out. */
export function groupBySymptom(trees: readonly TreeSummary[]): SymptomGroup[] {
  return SYMPTOMS.map((symptom) => ({
    symptom,
    label: SYMPTOM_LABELS[symptom],
    trees: trees.filter((t) => t.symptom === symptom).sort((a, b) => a.title.localeCompare(b.title)),
  })).filter((g) => g.trees.length > 0);
}
