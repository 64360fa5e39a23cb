/**
 * Writes Keeperline's invented demo season into sample-data/demo/. Deterministic: the same seed
 * gives the same bytes. Run: npx tsx --tsconfig analytics-api/tsconfig.json sample-data/generate.ts
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import Papa from 'papaparse';
import type { Breed } from '../shared/domain/breed';
import { parseIsoDate } from '../shared/domain/calendar-date';
import { importKind, type ImportKindKey } from '../shared/imports/import-kinds';
import type { DateOrder } from '../shared/imports/parse-date';
import { formatWeight, GRAMS_PER_OUNCE } from '../shared/units/weight';
import {
  ACCOUNTS, CLUB, DEMO_PASSWORD, DEMO_SEED, LAST_DAY, NON_MEMBER_EXHIBITORS, RABBITRIES, SHOWS, SIMULATION, TODAY,
  TRAIT_GENETICS, type WeightStyle,
} from './scenario';
import { type HerdSimulation, simulateHerd } from './simulate-herds';
import { seasonGrandChampions, simulateSeason } from './simulate-season';
import { STARTER_BREEDS } from './starter-breeds';

type Row = Record<string, string>;

function formatDate(iso: string, order: DateOrder): string {
  if (order === 'iso') return iso;
  const d = parseIsoDate(iso)!;
  return `${d.month}/${d.day}/${d.year}`;
}

/** A weight as the herd writes it: to the ounce on a lb-oz scale, to 10 g in kg, to 5 g in grams. */
function writeWeight(grams: number, style: WeightStyle): string {
  switch (style) {
    case 'lb-oz':
      return formatWeight(grams, 'lb-oz');
    case 'lb-oz-shorthand': {
      const oz = Math.round(grams / GRAMS_PER_OUNCE);
      return `${Math.floor(oz / 16)}-${String(oz % 16).padStart(2, '0')}`;
    }
    case 'kg':
      return formatWeight(grams, 'kg');
    case 'grams':
      return `${Math.round(grams / 5) * 5} g`;
  }
}

function toCsv(kind: ImportKindKey, rows: Row[]): string {
  const fields = importKind(kind).fields.map((f) => f.key);
  return `${Papa.unparse({ fields, data: rows.map((r) => fields.map((f) => r[f] ?? '')) }, { newline: '\n' })}\n`;
}

function herdFiles(h: HerdSimulation, champions: Set<string>): Record<string, string> {
  const { dateOrder } = h.rabbitry.importSettings;
  const style = h.rabbitry.weightStyle;
  const date = (d: string | null) => (d ? formatDate(d, dateOrder) : '');
  const animals: Row[] = h.animals.map((a) => {
    const left = a.exit && a.exit.date <= LAST_DAY ? a.exit : null;
    const stub = a.kind === 'stub';
    return {
      ear_id: a.earId,
      name: a.name ?? '',
      sex: a.sex,
      breed: a.breed.name,
      variety: a.variety,
      born: date(a.born),
      sire_ear_id: a.sire?.earId ?? '',
      dam_ear_id: a.dam?.earId ?? '',
      line: a.line,
      status: stub ? '' : left?.status ?? 'active',
      registration_no: a.registrationNo ?? '',
      grand_champion: stub ? '' : champions.has(`${h.rabbitry.name}|${a.earId}`) ? 'yes' : 'no',
      breeder: a.breeder ?? '',
      weight: a.stubWeightGrams ? writeWeight(a.stubWeightGrams, style) : '',
      litter_code: a.litter?.code ?? '',
      outside: stub ? 'yes' : 'no',
      notes: left ? `${left.status} on ${date(left.date)}` : '',
    };
  });
  const litters: Row[] = h.litters.map((l) => ({
    litter_code: l.code,
    sire_ear_id: l.sire.earId,
    dam_ear_id: l.dam.earId,
    bred_on: date(l.bredOn),
    kindled_on: date(l.kindledOn),
    born_alive: l.bornAlive?.toString() ?? '',
    born_dead: l.bornDead?.toString() ?? '',
    weaned: l.weaned?.toString() ?? '',
    weight_21d: l.weight21dGrams ? writeWeight(l.weight21dGrams, style) : '',
    notes: l.notes ?? '',
  }));
  const weights: Row[] = h.animals
    .flatMap((a) => a.weighings.map((w) => ({ a, w })))
    .sort((x, y) => (x.w.date < y.w.date ? -1 : x.w.date > y.w.date ? 1 : 0))
    .map(({ a, w }) => ({ ear_id: a.earId, weighed_on: date(w.date), weight: writeWeight(w.grams, style) }));
  const evaluations: Row[] = h.animals
    .filter((a) => a.evaluation !== null)
    .sort((x, y) => (x.evaluation!.date < y.evaluation!.date ? -1 : x.evaluation!.date > y.evaluation!.date ? 1 : 0))
    .map((a) => {
      const e = a.evaluation!;
      return {
        ear_id: a.earId,
        evaluated_on: date(e.date),
        evaluator: e.evaluator,
        ...Object.fromEntries(Object.entries(e.scores).map(([k, v]) => [k, String(v)])),
        notes: e.notes ?? '',
      };
    });
  const slug = h.rabbitry.slug;
  return {
    [`${slug}/animals.csv`]: toCsv('animals', animals),
    [`${slug}/litters.csv`]: toCsv('litters', litters),
    [`${slug}/weights.csv`]: toCsv('weights', weights),
    [`${slug}/evaluations.csv`]: toCsv('evaluations', evaluations),
  };
}

export interface DemoFiles {
  /** Path relative to sample-data/demo → file text. */
  files: Map<string, string>;
  herds: HerdSimulation[];
}

/** Generates the whole demo in memory. O(animals × weeks) for the herds; about a second. */
export function generateDemo(seed: number = DEMO_SEED): DemoFiles {
  const breeds: Breed[] = STARTER_BREEDS;
  const registrationCounter = { next: 1 };
  const herds = RABBITRIES.map((plan, i) => simulateHerd(plan, breeds, seed + 1000 * (i + 1), registrationCounter));
  const season = simulateSeason(herds, breeds, seed + 99);
  const champions = seasonGrandChampions(season.results, herds);

  const files = new Map<string, string>();
  const counts: Record<string, Record<string, number>> = {};
  for (const h of herds) {
    for (const [path, text] of Object.entries(herdFiles(h, champions))) files.set(path, text);
    counts[h.rabbitry.slug] = {
      animals: h.animals.length,
      outsideStubs: h.animals.filter((a) => a.kind === 'stub').length,
      litters: h.litters.length,
      weights: h.animals.reduce((s, a) => s + a.weighings.length, 0),
      evaluations: h.animals.filter((a) => a.evaluation).length,
      generations: 1 + Math.max(...h.animals.map((a) => a.generation)),
    };
  }
  files.set(
    'club/results.csv',
    toCsv(
      'results',
      season.results.map((r) => ({
        show_name: r.showName, show_date: r.showDate, location: r.location ?? '', judge: r.judge, sanction_no: r.sanctionNo ?? '',
        ear_id: r.earId ?? '', exhibitor: r.exhibitor, breed: r.breed, variety: r.variety ?? '', sex: r.sex, age_class: r.ageClass,
        entries_in_class: String(r.entriesInClass), exhibitors_in_class: String(r.exhibitorsInClass), placing: String(r.placing),
        awards: r.awards.join(' '),
      })),
    ),
  );

  const scenario = {
    about: 'Invented demo data for Keeperline. No real person, rabbitry, club, show or animal appears here.',
    today: TODAY,
    seed,
    club: { ...CLUB, memberRabbitries: RABBITRIES.map((r) => r.slug), resultsFile: 'club/results.csv' },
    rabbitries: RABBITRIES.map((r) => ({
      slug: r.slug, name: r.name, location: r.location, ownerEmail: r.ownerEmail, exhibitorName: r.name,
      breeds: r.units.map((u) => u.breed), lines: r.units.flatMap((u) => u.lines), importSettings: r.importSettings,
      files: ['animals', 'litters', 'weights', 'evaluations'].map((k) => `${r.slug}/${k}.csv`),
    })),
    accounts: ACCOUNTS.map((a) => ({ ...a, password: DEMO_PASSWORD })),
    season: { year: 2026, shows: SHOWS, nonMemberExhibitors: NON_MEMBER_EXHIBITORS, grandChampions: [...champions] },
    simulation: {
      heritabilities: Object.fromEntries(Object.entries(TRAIT_GENETICS).map(([k, v]) => [k, v.h2])),
      commonLitterVariances: Object.fromEntries(Object.entries(TRAIT_GENETICS).map(([k, v]) => [k, v.c2])),
      model:
        'liability = breeding value + common litter effect + individual environment (phenotypic variance 1); ' +
        "offspring breeding value = parents' mean + Mendelian sampling N(0, ½·h²) (parents' inbreeding ignored)",
      ...SIMULATION,
    },
    counts,
  };
  files.set('scenario.json', `${JSON.stringify(scenario, null, 2)}\n`);
  files.set('breeds.json', `${JSON.stringify(breeds, null, 2)}\n`);
  return { files, herds };
}

function writeDemo(outDir: string): void {
  const { files } = generateDemo();
  for (const [path, text] of files) {
    const target = join(outDir, path);
    mkdirSync(dirname(target), { recursive: true });
    writeFileSync(target, text);
  }
  console.log(`wrote ${files.size} files to ${outDir}`);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  writeDemo(join(dirname(fileURLToPath(import.meta.url)), 'demo'));
}
