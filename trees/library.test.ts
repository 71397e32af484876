import { describe, expect, it } from 'vitest';
import { validateTree } from './validate';
import { stepsInOrder } from './graph';
import { readingFor, stockLibrary } from './fixtures/walk-helpers';
import { SYMPTOMS } from './tree-format';

const library = stockLibrary();

describe.each(library)('stock tree $file', ({ file, json }) => {
  const { findings, stats, doc } = validateTree(json);

  it('passes the validator with no errors', () => {
    expect(findings.filter((f) => f.severity === 'error')).toEqual([]);
    expect(doc).toBeDefined();
  });

  it('can reach every cause it names, and every step', () => {
    const causes = Object.entries(doc!.machine.states).filter(([, s]) => s.meta.kind === 'cause').map(([id]) => id);
    expect(causes.length).toBeGreaterThan(0);
    expect(Object.keys(stats.shortestToCause).sort()).toEqual(causes.sort());
    expect(stepsInOrder(doc!)).toHaveLength(stats.steps);
  });

  it('can take every branch of every reading step with some reading', () => {
    const contexts = [{}, { altitudeM: 0 }, { altitudeM: 1500 }, { altitudeM: 3000 }];
    for (const [id, s] of Object.entries(doc!.machine.states)) {
      if (s.meta.kind !== 'reading') continue;
      const reading = s.meta.reading;
      const branches = Object.values(s.on ?? {}).flat();
      for (const b of branches) {
        const reachable = contexts.some((ctx) => readingFor(reading, b.guard!.params.is, ctx));
        expect(reachable, `${id}: no reading gives "${b.guard!.params.is}"`).toBe(true);
      }
    }
  });

  it('is the size the library promises, measures something, and warns where a step can hurt', () => {
    const states = Object.values(doc!.machine.states);
    expect(stats.steps).toBeGreaterThanOrEqual(10);
    expect(stats.steps).toBeLessThanOrEqual(30);
    expect(states.some((s) => s.meta.kind === 'reading')).toBe(true);
    expect(states.some((s) => s.meta.cautions.length > 0)).toBe(true);
    expect(file).toBe(`${doc!.id}.json`);
  });
});

describe('the stock library as a whole', () => {
  it('has at least 7 trees, one for every named symptom', () => {
    expect(library.length).toBeGreaterThanOrEqual(7);
    const covered = new Set(library.map(({ json }) => (json as { symptom: string }).symptom));
    expect(SYMPTOMS.filter((s) => s !== 'other' && !covered.has(s))).toEqual([]);
  });


  it('gives every tree its own id', () => {
    const ids = library.map(({ json }) => (json as { id: string }).id);
    expect(new Set(ids).size).toBe(ids.length);
  });
});
