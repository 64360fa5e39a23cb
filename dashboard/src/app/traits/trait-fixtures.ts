import type { HeritabilityEstimate, HeritabilityReport } from '@shared/contracts/analytics';

const Z = 1.959964;
/** An invented estimate with its interval h² ± 1.96 SE, as the API forms it. */
export function estimate(method: HeritabilityEstimate['method'], h2: number, se: number, n: number, over: Partial<HeritabilityEstimate> = {}): HeritabilityEstimate {
  return { method, h2, se, lower: h2 - Z * se, upper: h2 + Z * se, n, slope: method === 'paternal-half-sib' ? null : h2 / 2, slopeSe: method === 'paternal-half-sib' ? null : se / 2, anova: null, warnings: [], ...over };
}

export function heritabilityReport(over: Partial<HeritabilityReport> = {}): HeritabilityReport {
  return {
    scope: { kind: 'rabbitry', rabbitries: [{ id: 7, name: 'Brackenrow' }], description: 'Brackenrow only.' },
    asOf: '2026-12-01',
    warnings: ['Only 11 sires with offspring records: the half-sib estimate is unreliable (want 20 or more).'],
    trait: { key: 'weight_12w', label: 'Weight at 12 weeks', kind: 'weight', unit: 'grams', standardAgeDays: 84, toleranceDays: 10 },
    adjustment: 'Records are standardised within breed and sex.',
    counts: { animalsWithRecord: 110, sires: 12, dams: 25, sireFamilies: 8, damFamilies: 17, midparentFamilies: 22, halfSibSires: 11, halfSibOffspring: 109 },
    estimates: {
      sireOffspring: estimate('sire-offspring', 0.2, 0.56, 8),
      damOffspring: null,
      midparentOffspring: estimate('midparent-offspring', 0.23, 0.25, 22),
      halfSib: estimate('paternal-half-sib', 0.37, 0.32, 109, { anova: { sires: 11, offspring: 109, k0: 9.43, msBetween: 1.76, msWithin: 0.9, f: 1.95, t: 0.091 } }),
    },
    preferred: { method: 'midparent-offspring', reason: 'Smallest standard error (0.25) of the 3 estimates available.' },
    plausibleRange: { lower: 0.1, upper: 0.45, source: 'Published estimates for weight at 8–12 weeks in rabbits' },
    plausibleRangeNote: 'Published range: 0.1–0.45.',
    reading: 'Moderately heritable (h² ≈ 0.23 ± 0.25): selecting on it works, slowly.',
    scatter: {
      xLabel: 'Midparent, SD', yLabel: 'Offspring, SD',
      points: [{ x: -1, y: -0.5, animalId: 35, earId: 'BF135', rabbitryId: 7 }, { x: 0.5, y: 0.4, animalId: 36, earId: 'BF136', rabbitryId: 7 }, { x: 2, y: 0.1, animalId: 37, earId: 'BF137', rabbitryId: 7 }],
      total: 3,
      line: { slope: 0.23, intercept: 0.16 },
    },
    ...over,
  };
}
