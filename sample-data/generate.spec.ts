import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import { type Breed, breedSchema } from '../shared/domain/breed';
import { daysBetween } from '../shared/domain/calendar-date';
import { suggestMapping } from '../shared/imports/suggest-mapping';
import { importKind, type ImportKindKey } from '../shared/imports/import-kinds';
import type { ImportContext, ImportRecords } from '../shared/imports/import-records';
import { plausibleWeightRange } from '../shared/imports/plausible-weight-range';
import { validateRow } from '../shared/imports/validate-row';
import { GRAMS_PER_POUND } from '../shared/units/weight';
import { type DemoFiles, generateDemo } from './generate';
import { typeMerit } from './simulate-herds';
import { DEMO_SEED, LAST_DAY, RABBITRIES, SIM_TRAITS, TODAY } from './scenario';

const demoDir = join(fileURLToPath(new URL('.', import.meta.url)), 'demo');
const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');
const csv = (text: string) => Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });

/**
 * Wright's inbreeding coefficients by the tabular method (Emik & Terrill 1949; Falconer &
 * Mackay 1996 ch. 5): a(x,x) = 1 + ½·a(sire, dam); for x younger than y,
 * a(x,y) = ½·(a(sire_x, y) + a(dam_x, y)); F(x) = ½·a(sire_x, dam_x). `order` says who is younger.
 */
function inbreeding(parents: Map<string, { sire: string | null; dam: string | null; order: number }>): Map<string, number> {
  const memo = new Map<string, number>();
  const a = (x: string | null, y: string | null): number => {
    if (x === null || y === null || !parents.has(x) || !parents.has(y)) return 0;
    const key = x < y ? `${x}|${y}` : `${y}|${x}`;
    const known = memo.get(key);
    if (known !== undefined) return known;
    let value: number;
    if (x === y) {
      value = 1 + 0.5 * a(parents.get(x)!.sire, parents.get(x)!.dam);
    } else {
      const [young, old] = parents.get(x)!.order > parents.get(y)!.order ? [x, y] : [y, x];
      const p = parents.get(young)!;
      value = 0.5 * (a(p.sire, old) + a(p.dam, old));
    }
    memo.set(key, value);
    return value;
  };
  return new Map([...parents].map(([id, p]) => [id, 0.5 * a(p.sire, p.dam)]));
}

let demo: DemoFiles;
let breeds: Breed[];
const rows = (path: string) => csv(demo.files.get(path)!).data;

beforeAll(() => {
  demo = generateDemo();
  breeds = JSON.parse(demo.files.get('breeds.json')!) as Breed[];
});

describe('demo generator', () => {
  it('is deterministic: the same seed gives the same bytes, and the committed files are its output', () => {
    const again = generateDemo(DEMO_SEED);
    expect([...again.files.keys()]).toEqual([...demo.files.keys()]);
    for (const [path, text] of demo.files) {
      expect(sha256(again.files.get(path)!), path).toBe(sha256(text));
      expect(sha256(readFileSync(join(demoDir, path), 'utf8')), `${path} is stale: run npm run generate:demo`).toBe(sha256(text));
    }
    expect(sha256(generateDemo(DEMO_SEED + 1).files.get('club/results.csv')!)).not.toBe(sha256(demo.files.get('club/results.csv')!));
  });

  it('writes the agreed layout', () => {
    const expected = [
      'scenario.json', 'breeds.json', 'club/results.csv',
      ...RABBITRIES.flatMap((r) => ['animals', 'litters', 'weights', 'evaluations'].map((k) => `${r.slug}/${k}.csv`)),
    ];
    expect([...demo.files.keys()].sort()).toEqual(expected.sort());
    const bytes = [...demo.files.values()].reduce((s, t) => s + Buffer.byteLength(t), 0);
    expect(bytes).toBeLessThan(3 * 1024 * 1024);
  });

  it('ships a starter catalogue that passes the breed schema, every number marked from memory', () => {
    for (const b of breeds) {
      expect(breedSchema.safeParse(b).success, b.name).toBe(true);
      for (const sex of ['buck', 'doe'] as const) {
        for (const limits of Object.values(b.weightLimits[sex])) {
          if (limits) expect(limits.source).toBe('from memory — check against the current official standard');
        }
      }
    }
    expect(breeds.length).toBeGreaterThanOrEqual(3);
    expect(breeds.length).toBeLessThanOrEqual(4);
    const sixClass = breeds.filter((b) => b.classScheme === 'six-class');
    expect(sixClass).toHaveLength(1);
    expect(sixClass[0]!.weightLimits.buck.senior.idealGrams!).toBeGreaterThanOrEqual(Math.round(9 * GRAMS_PER_POUND));
  });

  it('lists one demo account per role, on example.test, with the demo password', () => {
    const scenario = JSON.parse(demo.files.get('scenario.json')!);
    const roles = scenario.accounts.map((a: { demoRole: string | null }) => a.demoRole).filter(Boolean).sort();
    expect(roles).toEqual(['admin', 'member', 'mentor', 'officer', 'owner', 'partner']);
    for (const a of scenario.accounts) {
      expect(a.email).toMatch(/@example\.test$/);
      expect(a.password).toBe('keeperline-demo');
    }
    expect(scenario.rabbitries).toHaveLength(4);
    expect(Object.keys(scenario.simulation.heritabilities)).toEqual(SIM_TRAITS);
  });

  it('has 600–1,000 animals over 5+ generations, and shows, classes and outsiders in range', () => {
    let animals = 0;
    for (const r of RABBITRIES) {
      const list = rows(`${r.slug}/animals.csv`);
      animals += list.length;
      const byId = new Map(list.map((a) => [a.ear_id!, a]));
      const depth = (id: string | undefined): number => (id && byId.has(id) ? 1 + Math.max(depth(byId.get(id)!.sire_ear_id), depth(byId.get(id)!.dam_ear_id)) : 0);
      expect(Math.max(...list.map((a) => depth(a.ear_id))), r.slug).toBeGreaterThanOrEqual(5);
      expect(list.some((a) => a.outside === 'yes'), r.slug).toBe(true);
    }
    expect(animals).toBeGreaterThanOrEqual(600);
    expect(animals).toBeLessThanOrEqual(1000);

    const results = rows('club/results.csv');
    const shows = new Set(results.map((r) => r.show_name));
    expect(shows.size).toBeGreaterThanOrEqual(10);
    expect(shows.size).toBeLessThanOrEqual(12);
    const classes = new Map<string, number>();
    for (const r of results) {
      const key = [r.show_name, r.breed, r.variety, r.sex, r.age_class].join('|');
      classes.set(key, (classes.get(key) ?? 0) + 1);
      expect(Number(r.entries_in_class)).toBeGreaterThanOrEqual(3);
      expect(Number(r.entries_in_class)).toBeLessThanOrEqual(15);
    }
    // Every entry of a class is listed, so the rows of a class number its entries.
    for (const r of results) expect(classes.get([r.show_name, r.breed, r.variety, r.sex, r.age_class].join('|'))).toBe(Number(r.entries_in_class));

    const herdIds = new Set(RABBITRIES.flatMap((r) => rows(`${r.slug}/animals.csv`).map((a) => a.ear_id)));
    const members = new Set(RABBITRIES.map((r) => r.name));
    const outsiders = results.filter((r) => !members.has(r.exhibitor!));
    expect(outsiders.length).toBeGreaterThan(0);
    expect(outsiders.some((r) => r.ear_id === '')).toBe(true);
    expect(outsiders.some((r) => r.ear_id !== '' && !herdIds.has(r.ear_id))).toBe(true);
    expect(outsiders.every((r) => !herdIds.has(r.ear_id))).toBe(true);
    expect(results.some((r) => members.has(r.exhibitor!) && herdIds.has(r.ear_id))).toBe(true);
  });

  it('every row of every file passes the import validators, with no warnings and no date after the last day', () => {
    const check = (kind: ImportKindKey, path: string, ctx: ImportContext, ctxFor?: (row: Record<string, string>) => ImportContext) => {
      const parsed = csv(demo.files.get(path)!);
      const mapping = suggestMapping(kind, parsed.meta.fields!, ctx.traits);
      expect(mapping.unmatchedHeaders, path).toEqual([]);
      expect(mapping.missingRequired, path).toEqual([]);
      expect(parsed.meta.fields, path).toEqual(importKind(kind).fields.map((f) => f.key));
      const values: ImportRecords[ImportKindKey][] = [];
      parsed.data.forEach((row, i) => {
        const r = validateRow(kind, row, ctxFor ? ctxFor(row) : ctx);
        expect({ row: i + 2, errors: r.errors, warnings: r.warnings }, path).toEqual({ row: i + 2, errors: [], warnings: [] });
        values.push(r.value!);
      });
      return values;
    };
    const ctxOf = (r: (typeof RABBITRIES)[number]): ImportContext => ({ ...r.importSettings, today: TODAY });
    for (const r of RABBITRIES) {
      const ctx = ctxOf(r);
      const animals = check('animals', `${r.slug}/animals.csv`, ctx) as ImportRecords['animals'][];
      const byId = new Map(animals.map((a) => [a.earId, a]));
      for (const a of animals) {
        if (a.born) expect(a.born <= LAST_DAY).toBe(true);
        for (const parent of [a.sireEarId, a.damEarId]) if (parent) expect(byId.has(parent), `${a.earId} parent ${parent}`).toBe(true);
        if (a.sireEarId) expect(byId.get(a.sireEarId)!.sex).toBe('buck');
        if (a.damEarId) expect(byId.get(a.damEarId)!.sex).toBe('doe');
      }
      const litters = check('litters', `${r.slug}/litters.csv`, ctx) as ImportRecords['litters'][];
      const codes = new Set(litters.map((l) => l.litterCode));
      expect(animals.every((a) => a.litterCode === null || codes.has(a.litterCode))).toBe(true);
      for (const l of litters) expect([l.sireEarId, l.damEarId].every((id) => byId.has(id))).toBe(true);

      const weights = check('weights', `${r.slug}/weights.csv`, ctx) as ImportRecords['weights'][];
      for (const w of weights) {
        const a = byId.get(w.earId)!;
        expect(w.weighedOn <= LAST_DAY).toBe(true);
        const range = plausibleWeightRange(breeds.find((b) => b.name === a.breed)!, a.sex, daysBetween(a.born!, w.weighedOn));
        expect(w.grams, `${w.earId} on ${w.weighedOn}`).toBeGreaterThanOrEqual(range.minGrams ?? 0);
        expect(w.grams, `${w.earId} on ${w.weighedOn}`).toBeLessThanOrEqual(range.maxGrams ?? Infinity);
      }
      const breedOf = (earId: string) => breeds.find((b) => b.name === byId.get(earId.toUpperCase())!.breed)!;
      const evaluations = check('evaluations', `${r.slug}/evaluations.csv`, ctx, (row) => ({
        ...ctx,
        traits: breedOf(row.ear_id!).evaluationTemplate.traits,
      })) as ImportRecords['evaluations'][];
      for (const e of evaluations) {
        const a = byId.get(e.earId)!;
        expect(e.evaluatedOn <= LAST_DAY).toBe(true);
        if (a.litterCode) expect(daysBetween(a.born!, e.evaluatedOn)).toBeGreaterThanOrEqual(120);
        if (a.litterCode) expect(daysBetween(a.born!, e.evaluatedOn)).toBeLessThanOrEqual(150);
      }
      expect(weights.length).toBeGreaterThan(animals.length * 5);
      expect(evaluations.length).toBeGreaterThan(animals.length / 3);
    }
    const results = check('results', 'club/results.csv', { dateOrder: 'iso', unitSetting: 'lb-oz', today: TODAY }) as ImportRecords['results'][];
    expect(results.every((r) => r.showDate >= '2026-01-01' && r.showDate <= LAST_DAY)).toBe(true);
  });

  it('the tabular inbreeding helper reproduces Falconer & Mackay (1996) ch. 5: half-sib offspring F = 1/8, full-sib 1/4', () => {
    const p = (sire: string | null, dam: string | null, order: number) => ({ sire, dam, order });
    const f = inbreeding(new Map([
      ['S', p(null, null, 0)], ['D1', p(null, null, 1)], ['D2', p(null, null, 2)],
      ['B', p('S', 'D1', 3)], ['G', p('S', 'D2', 4)], ['H', p('S', 'D1', 5)],
      ['X', p('B', 'G', 6)], ['Y', p('B', 'H', 7)],
    ]));
    expect(f.get('X')).toBe(0.125);
    expect(f.get('Y')).toBe(0.25);
  });

  it('line breeding leaves some animals inbred, none extremely', () => {
    const all: number[] = [];
    for (const r of RABBITRIES) {
      const list = rows(`${r.slug}/animals.csv`);
      const parents = new Map(list.map((a, i) => [a.ear_id!, { sire: a.sire_ear_id || null, dam: a.dam_ear_id || null, order: i }]));
      const f = [...inbreeding(parents).values()];
      expect(f.filter((x) => x > 0).length, r.slug).toBeGreaterThan(10);
      all.push(...f);
    }
    expect(all.some((x) => x >= 0.125)).toBe(true);
    expect(Math.max(...all)).toBeLessThan(0.4);
    expect(all.filter((x) => x === 0).length).toBeGreaterThan(0);
  });

  // Better sires place better through two links, each checked on the simulation's true values:
  // a sire passes on half its breeding value, and the judge ranks by type merit.
  const slope = (xs: number[], ys: number[]) => {
    const mx = xs.reduce((s, x) => s + x, 0) / xs.length;
    const my = ys.reduce((s, y) => s + y, 0) / ys.length;
    let sxy = 0;
    let sxx = 0;
    xs.forEach((x, i) => {
      sxy += (x - mx) * (ys[i]! - my);
      sxx += (x - mx) ** 2;
    });
    return sxy / sxx;
  };

  it('offspring type merit regresses on the sire’s true type breeding value with slope about ½ (Falconer & Mackay 1996 ch. 10)', () => {
    const bred = demo.herds.flatMap((h) => h.animals.filter((a) => a.kind === 'bred'));
    const b = slope(bred.map((a) => typeMerit(a.breed, a.sire!.bv)), bred.map((a) => a.merit));
    expect(bred.length).toBeGreaterThan(500);
    // Expected ½ (the sire's half of the breeding value); the sampling error here is about 0.1.
    expect(b).toBeGreaterThan(0.25);
    expect(b).toBeLessThan(0.75);
  });

  it('placings follow merit: members’ entries with higher type merit get higher class-size-adjusted placement scores', () => {
    const byKey = new Map(demo.herds.flatMap((h) => h.animals.map((a) => [`${h.rabbitry.name}|${a.earId}`, a])));
    const shown = rows('club/results.csv')
      .map((r) => ({ r, a: byKey.get(`${r.exhibitor}|${r.ear_id}`) }))
      .filter((x) => x.a !== undefined);
    // Placement score (n − p)/(n − 1): 1 = won, 0 = last.
    const score = shown.map(({ r }) => (Number(r.entries_in_class) - Number(r.placing)) / (Number(r.entries_in_class) - 1));
    expect(shown.length).toBeGreaterThan(300);
    expect(slope(shown.map((x) => x.a!.merit), score)).toBeGreaterThan(0.15);
  });
});
