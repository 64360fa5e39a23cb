import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  BreedingValuesReport, GrowthReport, HeritabilityReport, InbreedingReport, KeepersReport, LinesReport, PairingsReport,
  PlacementReport, RelationshipReport, SeasonReport, SeasonSettings,
} from '../../shared/contracts/analytics';
import { DEMO_DIR, loadDemoSeason } from '../../analytics-api/src/demo/load-demo-season';
import { resetDatabase, signIn, startTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
const agents = new Map<string, { agent: TestAgent; csrf: string }>();
async function as(email: string) {
  let a = agents.get(email);
  if (!a) {
    const s = await signIn(t.app, email);
    agents.set(email, (a = { agent: s.agent, csrf: s.csrfToken }));
  }
  return a.agent;
}
const get = async (email: string, path: string, status = 200) => {
  const res = await (await as(email)).get(`/api${path}`);
  expect(res.status, `${email} GET ${path} → ${res.status} ${JSON.stringify(res.body).slice(0, 300)}`).toBe(status);
  return res.body;
};

beforeAll(async () => { t = await startTestApp(); });
afterAll(async () => { await t?.close(); });

describe('analytics on an empty rabbitry (minimal demo)', () => {
  let r1: number;
  beforeAll(async () => { r1 = Number((await t.db.query("SELECT id FROM rabbitry WHERE name = 'Fenwick Hollow'"))[0].id); });

  it('every herd report answers 200 with empty results and a warning in words', async () => {
    const base = `/rabbitries/${r1}/analytics`;
    const placement = PlacementReport.parse(await get('owner@example.test', `${base}/placement`));
    expect(placement.parents).toEqual([]);
    expect(placement.warnings.join(' ')).toMatch(/no animals yet/);
    const h2 = HeritabilityReport.parse(await get('owner@example.test', `${base}/heritability?scope=all`));
    expect(h2.estimates).toEqual({ sireOffspring: null, damOffspring: null, midparentOffspring: null, halfSib: null });
    expect(h2.reading).toMatch(/Not enough records/);
    const growth = GrowthReport.parse(await get('owner@example.test', `${base}/growth`));
    expect(growth.references).toEqual([]);
    expect(growth.warnings.length).toBeGreaterThan(0);
    const inbreeding = InbreedingReport.parse(await get('owner@example.test', `${base}/inbreeding`));
    expect(inbreeding.summary).toBeNull();
    expect(inbreeding.warnings.length).toBeGreaterThan(0);
    const bv = BreedingValuesReport.parse(await get('mentor@example.test', `${base}/breeding-values`));
    expect(bv.animals).toEqual([]);
    expect(bv.warnings.join(' ')).toMatch(/No records/);
    const keepers = KeepersReport.parse(await get('partner@example.test', `${base}/keepers`));
    expect(keepers.candidates).toEqual([]);
    expect(keepers.warnings.join(' ')).toMatch(/No active juniors/);
    const lines = LinesReport.parse(await get('owner@example.test', `${base}/lines`));
    expect(lines.groups).toEqual([]);
    expect(lines.warnings.length).toBeGreaterThan(0);
  });

  it('a club without results answers its season with zero standings and a warning', async () => {
    const c2 = Number((await t.db.query("SELECT id FROM club WHERE name = 'Lowmere Coast Fanciers'"))[0].id);
    const season = SeasonReport.parse(await get('other-club@example.test', `/clubs/${c2}/analytics/season`));
    expect(season.standings.byExhibitor).toEqual([]);
    expect(season.warnings.join(' ')).toMatch(/no shows/i);
  });
});

describe('analytics on the demo season', () => {
  let herd: number; // Brackenfold Rabbitry, owned by owner@
  let other: number; // Tinderbrook Hollow: not visible to owner@
  let club: number;
  let herdAnimalIds: Set<number>;
  const simulated = { weight_12w: 0 };

  beforeAll(async () => {
    await resetDatabase(t.db);
    await loadDemoSeason(t.db);
    agents.clear();
    const id = async (sql: string) => Number((await t.db.query(sql))[0].id);
    herd = await id("SELECT id FROM rabbitry WHERE name = 'Brackenfold Rabbitry'");
    other = await id("SELECT id FROM rabbitry WHERE name = 'Tinderbrook Hollow'");
    club = await id("SELECT id FROM club WHERE name LIKE 'Quillmere Valley%'");
    herdAnimalIds = new Set((await t.db.query('SELECT id FROM animal WHERE rabbitry_id = ?', [herd])).map((r: { id: number }) => Number(r.id)));
    const scenario = JSON.parse(await readFile(join(DEMO_DIR, 'scenario.json'), 'utf8'));
    simulated.weight_12w = scenario.simulation.heritabilities.weight_12w;
  }, 120_000);

  const base = () => `/rabbitries/${herd}/analytics`;

  it('placement: parents of the herd ranked by shrunken top-3 share, with Wilson intervals and legs', async () => {
    const r = PlacementReport.parse(await get('owner@example.test', `${base()}/placement`));
    expect(r.totals.results).toBeGreaterThan(50);
    expect(r.parents.length).toBeGreaterThan(3);
    const [{ n: herdResults }] = await t.db.query('SELECT COUNT(*) AS n FROM show_result r JOIN animal a ON a.id = r.animal_id WHERE a.rabbitry_id = ?', [herd]);
    expect(r.totals.results).toBe(Number(herdResults));
    for (const p of r.parents) {
      expect(herdAnimalIds.has(p.parent.id)).toBe(true);
      expect(p.parent.sex).toBe('buck');
      expect(p.topK.lower).toBeLessThanOrEqual(p.topK.share);
      expect(p.topK.upper).toBeGreaterThanOrEqual(p.topK.share);
      expect(p.placementIndex!.lower).toBeLessThanOrEqual(p.placementIndex!.index);
      expect(p.legs).toBeGreaterThanOrEqual(0);
    }
    expect(r.parents.map((p) => p.rank)).toEqual([...r.parents.map((p) => p.rank)].sort((a, b) => a - b));
    // Every result has at most one sire: the sires' entries add up to the results with a sire.
    expect(r.parents.reduce((s, p) => s + p.entries, 0)).toBeLessThanOrEqual(r.totals.results);
    expect(r.parents.reduce((s, p) => s + p.legs, 0)).toBeGreaterThan(0);

    const does = PlacementReport.parse(await get('mentor@example.test', `${base()}/placement?parent=dam&k=1&sex=doe&minEntries=5`));
    expect(does.parents.every((p) => p.parent.sex === 'doe' && p.entries >= 5)).toBe(true);
    expect(does.totals.results).toBeLessThan(r.totals.results);
    const grand = PlacementReport.parse(await get('owner@example.test', `${base()}/placement?parent=grandsire`));
    expect(grand.parents.length).toBeGreaterThan(0);
  });

  it('heritability: a single-herd owner sees only their herd, also with scope=all', async () => {
    const own = HeritabilityReport.parse(await get('owner@example.test', `${base()}/heritability?trait=weight_12w`));
    expect(own.scope.rabbitries.map((r) => r.id)).toEqual([herd]);
    const pooled = HeritabilityReport.parse(await get('owner@example.test', `${base()}/heritability?trait=weight_12w&scope=all`));
    expect(pooled.scope.kind).toBe('pooled');
    expect(pooled.scope.rabbitries.map((r) => r.id)).toEqual([herd]);
    expect(pooled.scatter.points.length).toBeGreaterThan(20);
    for (const p of pooled.scatter.points) expect(herdAnimalIds.has(p.animalId)).toBe(true);
    const named = pooled.scatter.points[0]!;
    expect(named).toEqual({ x: expect.any(Number), y: expect.any(Number), animalId: expect.any(Number), earId: expect.any(String), rabbitryId: expect.any(Number) });
    expect(JSON.stringify(pooled)).not.toContain('Tinderbrook');
    expect(pooled.plausibleRange).toEqual(expect.objectContaining({ lower: 0.1, upper: 0.45 }));

    const trait = HeritabilityReport.parse(await get('owner@example.test', `${base()}/heritability?trait=body_type`));
    expect(trait.trait.kind).toBe('evaluation');
    expect(trait.plausibleRange).toBeNull();
    expect(trait.plausibleRangeNote).toMatch(/No published range/);
    expect(trait.counts.animalsWithRecord).toBeGreaterThan(50);

    const bad = await get('owner@example.test', `${base()}/heritability?trait=tail_length`, 400);
    expect(bad.error.code).toBe('validation');
  });

  // Recovery test: the demo simulates weight at 12 weeks with h² = 0.30
  // (sample-data/demo/scenario.json, simulation.heritabilities.weight_12w); pooled over all four
  // rabbitries, each estimator's 95 % interval (h² ± 1.96 SE) must hold the simulated value.
  it('recovery test: half-sib and midparent estimates of 12-week weight hold the simulated h² within 1.96 SE', async () => {
    const r = HeritabilityReport.parse(await get('admin@example.test', `${base()}/heritability?trait=weight_12w&scope=all`));
    expect(r.scope.rabbitries).toHaveLength(4);
    const { halfSib, midparentOffspring } = r.estimates;
    expect(halfSib).not.toBeNull();
    expect(midparentOffspring).not.toBeNull();
    console.log(`recovery: half-sib h² = ${halfSib!.h2.toFixed(3)} ± ${halfSib!.se.toFixed(3)} (${halfSib!.anova!.sires} sires, ${halfSib!.n} offspring); `
      + `midparent h² = ${midparentOffspring!.h2.toFixed(3)} ± ${midparentOffspring!.se.toFixed(3)} (${midparentOffspring!.n} families); simulated ${simulated.weight_12w}`);
    expect(halfSib!.anova!.sires).toBeGreaterThanOrEqual(20);
    expect(Math.abs(halfSib!.h2 - simulated.weight_12w)).toBeLessThanOrEqual(1.96 * halfSib!.se);
    expect(Math.abs(midparentOffspring!.h2 - simulated.weight_12w)).toBeLessThanOrEqual(1.96 * midparentOffspring!.se);
  });

  it('growth: LMS bands per breed and sex, each weighing’s percentile, projected senior weight against the limits', async () => {
    const [a, b] = (await t.db.query(
      `SELECT a.id FROM animal a WHERE a.rabbitry_id = ? AND NOT a.is_stub AND (SELECT COUNT(*) FROM weight_record w WHERE w.animal_id = a.id) >= 8 ORDER BY a.id LIMIT 2`, [herd])) as { id: number }[];
    const [foreign] = await t.db.query('SELECT id, ear_id FROM animal WHERE rabbitry_id = ? AND NOT is_stub LIMIT 1', [other]);
    const r = GrowthReport.parse(await get('owner@example.test', `${base()}/growth?animals=${a!.id},${b!.id},${foreign.id}`));
    expect(r.animals.map((x) => x.animal.id)).toEqual([a!.id, b!.id]);
    expect(r.warnings.join(' ')).toMatch(/not in this rabbitry/);
    expect(JSON.stringify(r)).not.toContain(`"${foreign.ear_id}"`);
    expect(r.references.length).toBeGreaterThan(0);
    for (const ref of r.references) {
      expect(ref.breed.name).toBe('Mini Rex');
      const filled = ref.bands.filter((x) => x.centiles !== null);
      expect(filled.length).toBeGreaterThan(20);
      for (const { centiles: c } of filled) {
        const v = [c!.p3, c!.p10, c!.p25, c!.p50, c!.p75, c!.p90, c!.p97];
        expect(v).toEqual([...v].sort((x, y) => x - y));
      }
      expect(ref.seniorLimits?.maxGrams).toBeGreaterThan(0);
      // Weekly to 26 weeks, then bands of 4 weeks or more with at least 20 weights, past the senior class age.
      expect(ref.bands.filter((x) => x.toDays <= 182).every((x) => x.toDays - x.fromDays === 7)).toBe(true);
      const adult = ref.bands.filter((x) => x.fromDays >= 182);
      expect(adult.length).toBeGreaterThan(0);
      for (const x of adult) {
        expect(x.toDays - x.fromDays).toBeGreaterThanOrEqual(28);
        expect(x.n).toBeGreaterThanOrEqual(20);
      }
      expect(ref.reachesDays).toBe(ref.bands.at(-1)!.toDays);
      expect(ref.reachesDays).toBeGreaterThan(243);
      if (ref.thinsOutFromDays !== null) {
        expect(ref.thinsOutFromDays).toBe(ref.reachesDays);
        expect(ref.warnings.join(' ')).toMatch(/Weighings thin out after \d+ weeks/);
      }
      // An adult's median weight lies within the breed's senior limits (demo breeds are simulated inside them).
      const oldest = adult.at(-1)!.centiles!.p50;
      expect(oldest).toBeGreaterThan(ref.seniorLimits!.minGrams ?? 0);
      expect(oldest).toBeLessThan(ref.seniorLimits!.maxGrams! * 1.1);
    }
    expect(r.seniorAgeDays).toBe(365);
    for (const x of r.animals) {
      expect(x.weighings.length).toBeGreaterThanOrEqual(8);
      for (const w of x.weighings.filter((v) => v.percentile !== null)) {
        expect(w.percentile).toBeGreaterThan(0);
        expect(w.percentile).toBeLessThan(100);
      }
      expect(x.projection).not.toBeNull();
      const ref = r.references.find((v) => v.sex === x.animal.sex)!;
      expect(x.projection!.ageDays).toBe(Math.min(365, ref.reachesDays - 1));
      expect(x.projection!.lower!).toBeLessThanOrEqual(x.projection!.grams);
      expect(x.projection!.upper!).toBeGreaterThanOrEqual(x.projection!.grams);
      expect(x.projection!.check!.disqualificationRisk).toBe(x.projection!.check!.status === 'over-maximum' || x.projection!.check!.status === 'under-minimum');
      expect(x.classification.length).toBeGreaterThan(10);
    }
  });

  it('inbreeding: every animal’s F; an animal’s F is half its parents’ relationship (Falconer & Mackay 1996, ch. 5)', async () => {
    const r = InbreedingReport.parse(await get('owner@example.test', `${base()}/inbreeding`));
    expect(r.animals.length).toBe(herdAnimalIds.size);
    expect(r.summary!.n).toBe(r.pedigree.herdAnimals);
    expect(r.inbred).toBeGreaterThan(0);
    expect(r.bands.reduce((s, b) => s + b.count, 0)).toBe(r.pedigree.herdAnimals);
    const top = r.topInbred[0]!;
    expect(top.f).toBe(r.summary!.max);
    expect(top.explanation).toMatch(/share ancestors/);
    expect(top.commonAncestors.reduce((s, c) => s + c.share, 0)).toBeLessThanOrEqual(1 + 1e-9);
    const row = r.animals.find((x) => x.animal.id === top.animal.id)!;
    const rel = RelationshipReport.parse(await get('owner@example.test', `${base()}/relationship?a=${row.sireId}&b=${row.damId}`));
    expect(rel.expectedOffspringInbreeding).toBeCloseTo(top.f, 12);
    expect(rel.oppositeSexes).toBe(true);
    expect(rel.commonAncestors.reduce((s, c) => s + c.contribution, 0) + rel.otherAncestorsContribution).toBeCloseTo(top.f, 12);

    const [foreign] = await t.db.query('SELECT id FROM animal WHERE rabbitry_id = ? LIMIT 1', [other]);
    await get('owner@example.test', `${base()}/relationship?a=${row.sireId}&b=${foreign.id}`, 404);
    await get('owner@example.test', `${base()}/relationship?a=${row.sireId}&b=${row.sireId}`, 400);
  });

  it('pairings: mates of the other sex of breeding age, expected inbreeding a/2, the does × bucks table', async () => {
    const [doe] = await t.db.query("SELECT id FROM animal WHERE rabbitry_id = ? AND sex = 'doe' AND status = 'active' AND NOT is_stub ORDER BY birth_date LIMIT 1", [herd]);
    const r = PairingsReport.parse(await get('owner@example.test', `${base()}/pairings?animal=${doe.id}&limit=5`));
    expect(r.candidates.length).toBeGreaterThan(0);
    expect(r.candidates.length).toBeLessThanOrEqual(5);
    for (const c of r.candidates) {
      expect(c.mate.sex).toBe('buck');
      expect(c.mate.status).toBe('active');
      expect(c.ageDays === null || c.ageDays >= r.breedingAgeDays).toBe(true);
    }
    const first = r.candidates[0]!;
    const rel = RelationshipReport.parse(await get('owner@example.test', `${base()}/relationship?a=${doe.id}&b=${first.mate.id}`));
    expect(first.expectedInbreeding).toBeCloseTo(rel.additiveRelationship / 2, 12);
    expect(r.matrix.values).toHaveLength(r.matrix.does.length);
    expect(r.matrix.does.length).toBeLessThanOrEqual(40);
    const col = r.matrix.bucks.findIndex((b) => b.id === first.mate.id);
    const rowIndex = r.matrix.does.findIndex((d) => d.id === doe.id);
    expect(r.matrix.values[rowIndex]![col]).toBeCloseTo(first.expectedInbreeding, 12);
    expect(r.cautions.join(' ')).toMatch(/veterinarian/);
    // The mates' accuracies are the BLUP's own (same trait and h² as the breeding-values report).
    const bv = BreedingValuesReport.parse(await get('owner@example.test', `${base()}/breeding-values?trait=weight_12w`));
    const accuracyOf = new Map(bv.animals.map((x) => [x.animal.id, x.accuracy]));
    const rated = r.candidates.filter((c) => c.mateEbv !== null);
    expect(rated.length).toBeGreaterThan(0);
    for (const c of rated) {
      expect(c.mateAccuracy).toBe(accuracyOf.get(c.mate.id));
      expect(c.mateAccuracy).toBeGreaterThan(0);
      expect(c.mateAccuracy).toBeLessThan(1);
    }
    expect(r.animal.accuracy).toBe(accuracyOf.get(doe.id) ?? null);
  });

  it('breeding values: converged BLUP, herd animals only, EBVs follow the own records', async () => {
    const r = BreedingValuesReport.parse(await get('owner@example.test', `${base()}/breeding-values?trait=weight_12w`));
    expect(r.convergence.converged).toBe(true);
    expect(r.convergence.relativeResidual).toBeLessThan(1e-8);
    expect(r.h2.source).not.toBe('user');
    expect(r.animals.every((x) => herdAnimalIds.has(x.animal.id))).toBe(true);
    expect(r.accuracyAvailable).toBe(true);
    const rec = r.animals.filter((x) => x.record !== null);
    expect(rec.length).toBe(r.model.records);
    // With h² around 0.3, an animal's EBV rises with its own record: their correlation is clearly positive.
    const xs = rec.map((x) => x.record!);
    const ys = rec.map((x) => x.ebv);
    const mx = xs.reduce((s, v) => s + v, 0) / xs.length;
    const my = ys.reduce((s, v) => s + v, 0) / ys.length;
    const cov = xs.reduce((s, v, i) => s + (v - mx) * (ys[i]! - my), 0);
    const corr = cov / Math.sqrt(xs.reduce((s, v) => s + (v - mx) ** 2, 0) * ys.reduce((s, v) => s + (v - my) ** 2, 0));
    expect(corr).toBeGreaterThan(0.3);

    const user = BreedingValuesReport.parse(await get('owner@example.test', `${base()}/breeding-values?trait=body_type&h2=0.4`));
    expect(user.h2).toEqual(expect.objectContaining({ value: 0.4, source: 'user' }));
    const placing = BreedingValuesReport.parse(await get('admin@example.test', `${base()}/breeding-values?trait=placement_score&scope=all`));
    expect(placing.model.fixedEffects.join(' ')).toMatch(/show/);
    expect(placing.animals.every((x) => x.animal.rabbitryId === herd)).toBe(true);
    await get('owner@example.test', `${base()}/breeding-values?h2=1.5`, 400);
  });

  it('keepers: juniors ranked by the index, every component and weight flag explained', async () => {
    const r = KeepersReport.parse(await get('owner@example.test', `${base()}/keepers`));
    expect(r.juniors).toBe(r.candidates.length);
    expect(r.juniors).toBeGreaterThan(0);
    for (const c of r.candidates) {
      expect(c.ageDays).toBeLessThan(184);
      expect(c.animal.isStub).toBe(false);
      expect(c.components).toHaveLength(5);
      for (const x of c.components) expect(x.contribution).toBeCloseTo(x.weight * x.z, 12);
      expect(c.total).toBeCloseTo(c.components.reduce((s, x) => s + x.contribution, 0), 12);
      expect(c.disqualificationRisk).toBe(c.weightFlags.some((f) => f.disqualificationRisk));
    }
    expect(r.candidates.map((c) => c.total)).toEqual([...r.candidates.map((c) => c.total)].sort((a, b) => b - a));
    const weighted = KeepersReport.parse(await get('owner@example.test', `${base()}/keepers?weights=inbreeding:0,breedingValue:2`));
    expect(weighted.weights).toEqual(expect.objectContaining({ inbreeding: 0, breedingValue: 2 }));
    for (const c of weighted.candidates) expect(c.components.map((x) => x.component)).not.toContain('inbreeding');
    await get('owner@example.test', `${base()}/keepers?weights=looks:3`, 400);
  });

  it('keepers: each rank explained in a breeder\'s words, weights in the reader\'s unit', async () => {
    const lbOz = KeepersReport.parse(await get('owner@example.test', `${base()}/keepers`));
    for (const c of lbOz.candidates) {
      const [first, ...risks] = c.explanation;
      expect(first).toMatch(new RegExp(`^Ranked ${c.rank}(st|nd|rd|th)( \\(tied\\))? of ${lbOz.candidates.length}: `));
      // No engine names or standardised scores.
      expect(first).not.toMatch(/breedingValue|weightOnTarget|parentsPlacementIndex|ownEvaluation| SD\b|z =/);
      expect(risks).toEqual(c.weightFlags.filter((f) => f.disqualificationRisk).map((f) => f.message));
    }
    const projected = lbOz.candidates.filter((c) => c.explanation[0]!.includes('projected senior weight'));
    expect(projected.length).toBeGreaterThan(0);
    for (const c of projected) expect(c.explanation[0]).toMatch(/projected senior weight \d+ lb \d+ oz/);
    await t.db.query("UPDATE user SET weight_unit = 'kg' WHERE email = 'mentor@example.test'");
    try {
      const kg = KeepersReport.parse(await get('mentor@example.test', `${base()}/keepers`));
      const same = kg.candidates.find((c) => c.animal.id === projected[0]!.animal.id)!;
      expect(same.explanation[0]).toMatch(/projected senior weight \d+\.\d{2} kg/);
    } finally {
      await t.db.query("UPDATE user SET weight_unit = 'lb-oz' WHERE email = 'mentor@example.test'");
    }
  });

  it('lines: quartiles per line, and per rabbitry only over what the caller may see', async () => {
    const r = LinesReport.parse(await get('owner@example.test', `${base()}/lines`));
    expect(r.groups.map((g) => g.label).sort()).toEqual(['Ember', 'Slate']);
    const inbreeding = r.measures.find((m) => m.key === 'inbreeding')!;
    expect(inbreeding.groups.reduce((s, g) => s + (g.summary?.n ?? 0), 0)).toBe(r.groups.reduce((s, g) => s + g.animals, 0));
    for (const m of r.measures) for (const g of m.groups) if (g.summary) expect(g.summary.q1).toBeLessThanOrEqual(g.summary.q3);
    const own = LinesReport.parse(await get('owner@example.test', `${base()}/lines?groupBy=rabbitry`));
    expect(own.groups.map((g) => g.label)).toEqual(['Brackenfold Rabbitry']);
    const all = LinesReport.parse(await get('admin@example.test', `${base()}/lines?groupBy=rabbitry&measure=weight_12w_percentile`));
    expect(all.groups).toHaveLength(4);
    expect(all.measures.map((m) => m.key)).toEqual(['weight_12w_percentile']);
    await get('owner@example.test', `${base()}/lines?measure=ear_length`, 400);
  });

  it('lines: each median with its order-statistic interval, the breeding cautions, and breed / sex / birth-date filters', async () => {
    const r = LinesReport.parse(await get('owner@example.test', `${base()}/lines`));
    expect(r.cautions.join(' ')).toMatch(/smaller litters/);
    expect(r.filtered).toBeNull();
    let checked = 0;
    for (const m of r.measures) {
      for (const g of m.groups) {
        if (!g.summary) continue;
        if (g.summary.n < 6) { expect(g.medianInterval).toBeNull(); continue; }
        const ci = g.medianInterval!;
        expect(ci.n).toBe(g.summary.n);
        expect(ci.lowerRank + ci.upperRank).toBe(ci.n + 1);
        expect(ci.lower).toBeLessThanOrEqual(g.summary.median);
        expect(ci.upper).toBeGreaterThanOrEqual(g.summary.median);
        expect(ci.coverage).toBeGreaterThanOrEqual(0.95);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(4);

    const [{ n }] = await t.db.query(
      "SELECT COUNT(*) AS n FROM animal WHERE rabbitry_id = ? AND NOT is_stub AND sex = 'doe' AND birth_date BETWEEN '2024-01-01' AND '2026-12-31'", [herd]);
    const does = LinesReport.parse(await get('owner@example.test', `${base()}/lines?measure=inbreeding&sex=doe&from=2024-01-01&to=2026-12-31`));
    expect(does.filtered).toBe('Does born 2024-01-01 to 2026-12-31');
    expect(does.measures[0]!.groups.reduce((s, g) => s + (g.summary?.n ?? 0), 0)).toBe(Number(n));
    const [breed] = await t.db.query('SELECT b.id, b.name FROM animal a JOIN breed b ON b.id = a.breed_id WHERE a.rabbitry_id = ? LIMIT 1', [herd]);
    const ofBreed = LinesReport.parse(await get('owner@example.test', `${base()}/lines?breed=${breed.id}&sex=buck`));
    expect(ofBreed.filtered).toBe(`${breed.name} bucks`);
    await get('owner@example.test', `${base()}/lines?from=2026-02-01&to=2026-01-01`, 400);
  });

  it('sends an unchanged report gzipped with an entity tag, and answers a conditional request with 304', async () => {
    const agent = await as('owner@example.test');
    const first = await agent.get(`/api${base()}/inbreeding`).set('Accept-Encoding', 'gzip');
    expect(first.status).toBe(200);
    expect(first.headers['content-encoding']).toBe('gzip');
    expect(first.headers.etag).toMatch(/^"[\w-]+-gz"$/);
    expect(InbreedingReport.parse(first.body).animals.length).toBe(herdAnimalIds.size);
    const again = await agent.get(`/api${base()}/inbreeding`).set('Accept-Encoding', 'gzip').set('If-None-Match', first.headers.etag!);
    expect(again.status).toBe(304);
    const plain = await agent.get(`/api${base()}/inbreeding`).set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.headers.etag).not.toBe(first.headers.etag);
  });

  it('refuses callers without a role in the rabbitry or club', async () => {
    await get('member@example.test', `${base()}/placement`, 404);
    await get('other-club@example.test', `${base()}/keepers`, 404);
    await get('other-club@example.test', `/clubs/${club}/analytics/season`, 404);
    await get('partner@example.test', `/clubs/${club}/analytics/season`, 404);
  });

  it('season: default points 6/4/3/2/1 × entries agree with a sum over the results in SQL', async () => {
    const r = SeasonReport.parse(await get('member@example.test', `/clubs/${club}/analytics/season`));
    expect(r.formulaIsDefault).toBe(true);
    const [{ n }] = await t.db.query('SELECT COUNT(*) AS n FROM show_result r JOIN `show` s ON s.id = r.show_id WHERE s.club_id = ?', [club]);
    expect(r.totals.results).toBe(Number(n));
    const sql: { exhibitor: string; points: string }[] = await t.db.query(
      `SELECT r.exhibitor, SUM(CASE r.placing WHEN 1 THEN 6 WHEN 2 THEN 4 WHEN 3 THEN 3 WHEN 4 THEN 2 WHEN 5 THEN 1 ELSE 0 END * r.entries_in_class) AS points
         FROM show_result r JOIN \`show\` s ON s.id = r.show_id WHERE s.club_id = ? GROUP BY r.exhibitor`, [club]);
    const expected = new Map(sql.map((x) => [x.exhibitor, Number(x.points)]));
    for (const s of r.standings.byExhibitor) expect(s.points).toBe(expected.get(s.exhibitor));
    for (const line of r.cumulative.series) {
      expect(line.points.at(-1)).toBe(expected.get(line.exhibitor));
      expect(line.points).toEqual([...line.points].sort((a, b) => a - b));
    }
    expect(r.entries.counts.flat().reduce((s, n) => s + n, 0)).toBe(r.totals.results);
    expect(r.legs.some((l) => l.isMember && l.legs > 0)).toBe(true);
    expect(r.topSires.length).toBeGreaterThan(3);
    // Members see exhibitors and sires, not the names of other members' herds' private records.
    expect(r.topSires.every((s) => s.exhibitor !== null)).toBe(true);
  });

  it('season settings: officers set a flat table with bonuses, the next report uses it; others are refused', async () => {
    const officer = await as('officer@example.test');
    const csrf = agents.get('officer@example.test')!.csrf;
    const body = { seasonStart: '2026-03-01', seasonEnd: '2026-11-30', pointsFormula: { kind: 'flat', table: [10, 7, 5, 3, 1], bonuses: { BOB: 5 } } };
    const bad = await officer.put(`/api/clubs/${club}/season`).set('x-csrf-token', csrf).send({ ...body, seasonEnd: '2026-01-01' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.seasonEnd).toMatch(/ends on or after/);
    const res = await officer.put(`/api/clubs/${club}/season`).set('x-csrf-token', csrf).send(body);
    expect(res.status).toBe(200);
    expect(SeasonSettings.parse(res.body).pointsFormula).toEqual(body.pointsFormula);
    const member = await as('member@example.test');
    const refused = await member.put(`/api/clubs/${club}/season`).set('x-csrf-token', agents.get('member@example.test')!.csrf).send(body);
    expect(refused.status).toBe(403);

    await new Promise((r) => setTimeout(r, 1100)); // the cache trusts a stamp for at most 1 s
    const r = SeasonReport.parse(await get('member@example.test', `/clubs/${club}/analytics/season`));
    expect(r.formulaIsDefault).toBe(false);
    expect(r.from).toBe('2026-03-01');
    const sql: { exhibitor: string; points: string }[] = await t.db.query(
      `SELECT r.exhibitor, SUM(CASE r.placing WHEN 1 THEN 10 WHEN 2 THEN 7 WHEN 3 THEN 5 WHEN 4 THEN 3 WHEN 5 THEN 1 ELSE 0 END
              + IF(FIND_IN_SET('BOB', REPLACE(r.awards, ' ', ',')) > 0, 5, 0)) AS points
         FROM show_result r JOIN \`show\` s ON s.id = r.show_id WHERE s.club_id = ? AND s.show_date >= '2026-03-01' GROUP BY r.exhibitor`, [club]);
    const expected = new Map(sql.map((x) => [x.exhibitor, Number(x.points)]));
    expect(r.standings.byExhibitor.length).toBe(expected.size);
    for (const s of r.standings.byExhibitor) expect(s.points).toBe(expected.get(s.exhibitor));
  });

  it('a change to the records refreshes the cached reports', async () => {
    const [a] = await t.db.query(
      `SELECT a.id, MAX(w.weighed_on) AS last FROM animal a JOIN weight_record w ON w.animal_id = a.id WHERE a.rabbitry_id = ? AND NOT a.is_stub GROUP BY a.id ORDER BY a.id LIMIT 1`, [herd]);
    const before = GrowthReport.parse(await get('owner@example.test', `${base()}/growth?animals=${a.id}`));
    const count = before.animals[0]!.weighings.length;
    await t.db.query("INSERT INTO weight_record (animal_id, weighed_on, grams) VALUES (?, DATE_ADD(?, INTERVAL 1 DAY), 2100)", [a.id, a.last]);
    await new Promise((r) => setTimeout(r, 1100));
    const after = GrowthReport.parse(await get('owner@example.test', `${base()}/growth?animals=${a.id}`));
    expect(after.animals[0]!.weighings).toHaveLength(count + 1);
  });
});
