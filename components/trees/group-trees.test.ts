import { describe, expect, it } from 'vitest';
import type { TreeSummary } from '@/shared/schemas/trees';
import { groupBySymptom } from './group-trees';

const tree = (id: number, symptom: TreeSummary['symptom'], title: string): TreeSummary => ({
  id,
  slug: `t-${id}`,
  title,
  symptom,
  installTypes: ['throttle_body'],
  summary: '',
  status: 'active',
  source: 'stock',
  publishedVersion: 1,
  steps: 12,
  updatedAt: '2026-12-01T00:00:00.000Z',
});

describe('groupBySymptom', () => {
  it('groups in the product symptom order, sorts titles, and leaves out empty symptoms', () => {
    const groups = groupBySymptom([tree(1, 'hiss_at_idle', 'Whistle'), tree(2, 'lean_code', 'Zeta'), tree(3, 'lean_code', 'Alpha')]);
    expect(groups.map((g) => g.symptom)).toEqual(['lean_code', 'hiss_at_idle']);
    expect(groups[0].trees.map((t) => t.title)).toEqual(['Alpha', 'Zeta']);
    expect(groups[0].label).toBe('Lean code or high positive fuel trims');
  });

  it('gives nothing for no trees', () => {
    expect(groupBySymptom([])).toEqual([]);
  });
});
