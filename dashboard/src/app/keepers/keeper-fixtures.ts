import type { KeepersReport } from '@shared/contracts/analytics';

type Candidate = KeepersReport['candidates'][number];

/**
 * Invented keeper board for tests: the juniors' standardised scores (z) are worked by hand from
 * the raw values with the sample SD, so the totals can be checked: total = Σ weight × z.
 */
export function candidate(over: Partial<Candidate> & { earId: string; id: number; rank: number; z: [number, number, number, number, number]; values?: (number | null)[] }): Candidate {
  const names = ['breedingValue', 'ownEvaluation', 'weightOnTarget', 'parentsPlacementIndex', 'inbreeding'] as const;
  const labels = ['Breeding value (weight at 12 weeks)', 'Own evaluation', 'Weight on target', "Parents' placement index", 'Inbreeding'];
  const values = over.values ?? [0.4, 80, -5, 1.2, 0.0625];
  const components = names.map((component, i) => ({
    component, label: labels[i]!, value: values[i] ?? null, z: over.z[i]!, weight: 1, contribution: over.z[i]!,
  }));
  const { earId, id, rank, z: _z, values: _v, ...rest } = over;
  return {
    animal: { id, rabbitryId: 7, earId, name: null, sex: 'doe', breedId: 1, breed: 'Mini Rex', variety: 'Blue', line: null, birthDate: '2026-07-18', status: 'active', isStub: false },
    ageDays: 136,
    rank,
    total: components.reduce((s, c) => s + c.contribution, 0),
    components,
    latestWeight: { weighedOn: '2026-11-26', grams: 1531 },
    projectedSeniorWeight: {
      ageDays: 243, grams: 1792, lower: 1594, upper: 1871, percentile: 27, z: -0.61, weighingsUsed: 3,
      check: { status: 'within-limits', disqualificationRisk: false, gramsFromIdeal: -136 }, upperOverMaximum: false,
    },
    weightFlags: [],
    disqualificationRisk: false,
    keeperDecision: null,
    explanation: [],
    ...rest,
  };
}

export function keepersReport(candidates: Candidate[], over: Partial<KeepersReport> = {}): KeepersReport {
  return {
    scope: { kind: 'rabbitry', rabbitries: [{ id: 7, name: 'Brackenrow' }], description: 'Brackenrow only.' },
    asOf: '2026-12-01',
    warnings: [],
    cautions: ['Support the hindquarters whenever you handle or pose a rabbit.', 'These figures support your judgment; they do not replace a judge, the official breed standard or a veterinarian.'],
    weights: { breedingValue: 1, ownEvaluation: 1, weightOnTarget: 1, parentsPlacementIndex: 1, inbreeding: 1 },
    trait: { key: 'weight_12w', label: 'Weight at 12 weeks', kind: 'weight', unit: 'grams', standardAgeDays: 84, toleranceDays: 10 },
    juniors: candidates.length,
    candidates,
    ...over,
  };
}
