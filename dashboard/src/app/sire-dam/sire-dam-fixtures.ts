import type { ParentPlacement, PlacementReport } from '@shared/contracts/analytics';

/** Invented placement figures for tests (shares and Wilson limits as the API would send them). */
export function parent(id: number, earId: string, rank: number, entries: number, count: number, over: Partial<ParentPlacement> = {}): ParentPlacement {
  const share = count / entries;
  return {
    parent: { id, rabbitryId: 7, earId, name: null, sex: 'buck', breedId: 1, breed: 'Mini Rex', variety: 'Castor', line: null, birthDate: '2024-08-26', status: 'active', isStub: false },
    rank,
    entries,
    offspringShown: Math.max(1, Math.round(entries / 3)),
    topK: { count, n: entries, share, lower: Math.max(0, share - 0.15), upper: Math.min(1, share + 0.1) },
    meanPlacementScore: { mean: 0.7, se: 0.05, n: entries },
    placementIndex: { index: 1.3, lower: 1.1, upper: 1.5, observed: count, expected: count / 1.3 },
    legs: 2,
    grandChampions: 0,
    shrunkenShare: share * 0.8 + 0.16,
    shrinkage: 0.2,
    warnings: entries < 20 ? [`Only ${entries} results: treat the rate as a rough guide (want 20 or more).`] : [],
    ...over,
  };
}

export function placementReport(parents: ParentPlacement[], over: Partial<PlacementReport> = {}): PlacementReport {
  const results = parents.reduce((s, p) => s + p.entries, 0);
  return {
    scope: { kind: 'rabbitry', rabbitries: [{ id: 7, name: 'Brackenrow' }], description: 'Brackenrow only.' },
    asOf: '2026-12-01',
    warnings: [],
    parentKind: 'sire',
    k: 3,
    totals: { results, offspringShown: 10, parents: parents.length, parentsListed: parents.length },
    herd: { topK: { count: 115, n: 141, share: 115 / 141, lower: 0.7435, upper: 0.8709 }, meanPlacementScore: { mean: 0.68, se: 0.03, n: 141 } },
    prior: { mean: 0.82, rho: 0.06, alpha: 12.9, beta: 2.9 },
    parents,
    ...over,
  };
}
