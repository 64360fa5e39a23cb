import type { GrowthAnimal, GrowthReferenceReport, GrowthReport } from '@shared/contracts/analytics';

/** Invented centiles in grams for two weekly bands (56–63 and 84–91 days) and one band without weights. */
export function reference(sex: 'buck' | 'doe' = 'doe', breedId = 1): GrowthReferenceReport {
  return {
    breed: { id: breedId, name: breedId === 1 ? 'Mini Rex' : 'Holland Lop' },
    sex,
    weighings: 1074,
    animals: 95,
    reachesDays: 252,
    thinsOutFromDays: 252,
    weighingsBeyond: 2,
    bands: [
      { fromDays: 56, toDays: 63, midDays: 59.5, n: 67, method: 'lms', lms: { L: 0.45, M: 808, S: 0.09 }, centiles: { p3: 680, p10: 720, p25: 760, p50: 808, p75: 860, p90: 907, p97: 956 } },
      { fromDays: 63, toDays: 70, midDays: 66.5, n: 0, method: null, lms: null, centiles: null },
      { fromDays: 84, toDays: 91, midDays: 87.5, n: 48, method: 'empirical', lms: null, centiles: { p3: 1029, p10: 1091, p25: 1154, p50: 1225, p75: 1297, p90: 1362, p97: 1427 } },
    ],
    seniorLimits: { minGrams: 1474, idealGrams: 1928, maxGrams: 2041 },
    warnings: [],
  };
}

export function growthAnimal(id: number, earId: string, over: Partial<GrowthAnimal> = {}): GrowthAnimal {
  return {
    animal: { id, rabbitryId: 7, earId, name: null, sex: 'doe', breedId: 1, breed: 'Mini Rex', variety: 'Blue', line: null, birthDate: '2026-07-18', status: 'active', isStub: false },
    weighings: [
      { weighedOn: '2026-09-12', ageDays: 56, grams: 800, z: 0, percentile: 48.6 },
      { weighedOn: '2026-10-10', ageDays: 84, grams: 1250, z: 0.3, percentile: 62.2 },
      { weighedOn: '2027-05-01', ageDays: 287, grams: 1950, z: null, percentile: null },
    ],
    latestPercentile: 62.2,
    projection: { ageDays: 243, grams: 1900, lower: 1800, upper: 2000, percentile: 60, z: 0.25, weighingsUsed: 2, check: { status: 'on-ideal', disqualificationRisk: false, gramsFromIdeal: -28 }, upperOverMaximum: false },
    idealGrams: 1928,
    maxGrams: 2041,
    classification: 'Projected on the ideal senior weight.',
    warnings: [],
    ...over,
  };
}

export function growthReport(over: Partial<GrowthReport> = {}): GrowthReport {
  return {
    scope: { kind: 'pooled', rabbitries: [{ id: 7, name: 'Brackenrow' }], description: 'Pooled over the one rabbitry you may see: Brackenrow.' },
    asOf: '2026-12-01',
    warnings: [],
    centiles: [3, 10, 25, 50, 75, 90, 97],
    seniorAgeDays: 243,
    references: [reference('buck'), reference('doe')],
    animals: [],
    ...over,
  };
}
