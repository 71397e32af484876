import { describe, expect, it } from 'vitest';
import type { TreeSummary } from '@/shared/schemas/trees';
import { treesForJob } from './tree-order';

const tree = (id: number, symptom: TreeSummary['symptom'], installTypes: TreeSummary['installTypes'], publishedVersion: number | null = 1): TreeSummary => ({
  id, slug: `t${id}`, title: `Tree ${id}`, symptom, installTypes, summary: '', status: 'active', source: 'stock', publishedVersion, steps: 5, updatedAt: '',
});

describe('trees for a job', () => {
  it('suggests trees matching the install first, most matches first, and leaves unpublished trees out', () => {
    const trees = [
      tree(1, 'lean_code', ['intake_manifold']),
      tree(2, 'high_or_hunting_idle', ['throttle_body', 'intake_manifold']),
      tree(3, 'hard_brake_pedal', ['camshaft']),
      tree(4, 'lean_code', ['intake_manifold'], null),
    ];
    const { suggested, bySymptom } = treesForJob(trees, ['intake_manifold', 'throttle_body']);
    expect(suggested.map((t) => t.id)).toEqual([2, 1]);
    expect(bySymptom.map((g) => [g.symptom, g.trees.map((t) => t.id)])).toEqual([['hard_brake_pedal', [3]]]);
  });
});
