import type { Breed } from '../shared/domain/breed';
import { addDays, daysBetween } from '../shared/domain/calendar-date';
import { GESTATION_DAYS } from '../shared/domain/gestation';
import { type PedigreeNode, registrationReadiness } from '../shared/domain/registration';
import type { AnimalStatus, Sex } from '../shared/domain/terms';
import { matureWeight, meanWeightAt, sizeClass } from './growth';
import { Random } from './random';
import { ACCOUNTS, LAST_DAY, type RabbitryPlan, SIM_TRAITS, SIMULATION, type SimTrait, TRAIT_GENETICS } from './scenario';

export type TraitValues = Record<SimTrait, number>;

export interface SimWeighing {
  date: string;
  grams: number;
}

export interface SimEvaluation {
  date: string;
  evaluator: string;
  scores: Record<string, number>;
  notes: string | null;
}

export interface SimLitter {
  code: string;
  sire: SimAnimal;
  dam: SimAnimal;
  bredOn: string;
  kindledOn: string | null;
  bornAlive: number | null;
  bornDead: number | null;
  weaned: number | null;
  weight21dGrams: number | null;
  notes: string | null;
  /** Shared by the litter's kits, per trait. */
  commonEffect: TraitValues;
}

export interface SimAnimal {
  rabbitry: string;
  breed: Breed;
  earId: string;
  name: string | null;
  sex: Sex;
  variety: string;
  born: string | null;
  sire: SimAnimal | null;
  dam: SimAnimal | null;
  line: string;
  kind: 'stub' | 'founder' | 'bred';
  breeder: string | null;
  litter: SimLitter | null;
  generation: number;
  /** True breeding values and phenotypes (a + c + e) on the liability scale. */
  bv: TraitValues;
  phenotype: TraitValues;
  /** Weight relative to the breed-and-sex curve: 1 + cv × 12-week-weight phenotype. */
  growthScale: number;
  /** Type merit: points-weighted, standardised sum of the type-trait phenotypes. */
  merit: number;
  arrived: string | null;
  exit: { date: string; status: Exclude<AnimalStatus, 'active'> } | null;
  keeper: boolean;
  breederScore: number | null;
  registrationNo: string | null;
  grandChampion: boolean;
  stubWeightGrams: number | null;
  weighings: SimWeighing[];
  evaluation: SimEvaluation | null;
  schedule: {
    weighOn: string | null;
    earlySaleOn: string | null;
    evaluateOn: string | null;
    decideOn: string | null;
    registerOn: string | null;
    retireOn: string | null;
  };
  breeding: { pregnant: boolean; lastKindled: string | null; restUntil: string | null };
}

export interface HerdSimulation {
  rabbitry: RabbitryPlan;
  animals: SimAnimal[];
  litters: SimLitter[];
}

const TYPE_TRAITS = SIM_TRAITS.filter((t) => t !== 'weight_12w');

const NAMES = [
  'Thistle', 'Bramble', 'Pepper', 'Juniper', 'Clover', 'Sorrel', 'Tansy', 'Rowan', 'Hazel', 'Linden', 'Marlow', 'Pippin',
  'Quince', 'Russet', 'Sable', 'Tamsin', 'Umber', 'Vetch', 'Willow', 'Yarrow', 'Alder', 'Birch', 'Cinder', 'Dapple',
  'Elder', 'Fennel', 'Ginger', 'Heather', 'Ivy', 'Jasper', 'Kestrel', 'Larch', 'Maple', 'Nettle', 'Oakley', 'Poppy',
  'Rook', 'Saffron', 'Teasel', 'Wren', 'Acorn', 'Barley', 'Cobble', 'Dusk', 'Ember', 'Flint', 'Gorse', 'Holly',
  'Inkcap', 'Jet', 'Kale', 'Lark', 'Moss', 'Nutmeg', 'Onyx', 'Pebble', 'Quill', 'Rye', 'Sage', 'Thyme', 'Velvet',
  'Wicker', 'Aster', 'Basil', 'Caraway', 'Dill', 'Fern', 'Garnet', 'Hops', 'Indigo', 'Kelp', 'Lupin', 'Mallow',
];

function emptyTraits(): TraitValues {
  return Object.fromEntries(SIM_TRAITS.map((t) => [t, 0])) as TraitValues;
}

function traitPoints(breed: Breed): Map<string, number> {
  return new Map(breed.evaluationTemplate.traits.map((t) => [t.key, t.points]));
}

/** Type merit M = Σ wᵢ zᵢ / √Σ wᵢ², so that M has variance 1 when the zᵢ are independent with variance 1. */
export function typeMerit(breed: Breed, phenotype: TraitValues): number {
  const points = traitPoints(breed);
  let sum = 0;
  let norm = 0;
  for (const t of TYPE_TRAITS) {
    const w = points.get(t) ?? 0;
    sum += w * phenotype[t];
    norm += w * w;
  }
  return sum / Math.sqrt(norm);
}

function isInHerd(a: SimAnimal, date: string): boolean {
  return a.arrived !== null && a.arrived <= date && (a.exit === null || a.exit.date > date);
}

/** The animal's weight on a day by its growth curve, without the scatter of a weighing. */
export function modelWeight(a: SimAnimal, date: string): number {
  if (!a.born) throw new Error('modelWeight requires a birth date');
  return meanWeightAt(a.breed, a.sex, daysBetween(a.born, date)) * a.growthScale;
}

export function latestWeighing(a: SimAnimal, onOrBefore: string): SimWeighing | null {
  let latest: SimWeighing | null = null;
  for (const w of a.weighings) if (w.date <= onOrBefore) latest = w;
  return latest;
}

/** Simulates one rabbitry from its founders' arrival to the last day. */
export function simulateHerd(plan: RabbitryPlan, breeds: readonly Breed[], seed: number, registrationCounter: { next: number }): HerdSimulation {
  const rng = new Random(seed);
  const animals: SimAnimal[] = [];
  const litters: SimLitter[] = [];
  const usedEarIds = new Set<string>();
  const names = rng.shuffle(NAMES);
  let nameCount = 0;
  let earCount = 0;
  const litterCounts = new Map<string, number>();
  const owner = ACCOUNTS.find((a) => a.email === plan.ownerEmail)!.displayName;
  const mentor = ACCOUNTS.find((a) => a.rabbitries.some((r) => r.slug === plan.slug && r.role === 'mentor'))?.displayName ?? null;
  const pending: { doe: SimAnimal; litter: SimLitter; kindleOn: string }[] = [];

  const nextName = () => {
    const base = names[nameCount % names.length]!;
    const round = Math.floor(nameCount / names.length);
    nameCount++;
    return round === 0 ? base : `${base} ${['II', 'III', 'IV', 'V', 'VI'][round - 1] ?? round + 1}`;
  };
  const nextEarId = () => `${plan.earPrefix}${String(++earCount).padStart(3, '0')}`;
  const sd = (t: SimTrait, part: 'a' | 'c' | 'e') => {
    const g = TRAIT_GENETICS[t];
    return Math.sqrt(part === 'a' ? g.h2 : part === 'c' ? g.c2 : 1 - g.h2 - g.c2);
  };
  const commonEffects = (): TraitValues => {
    const c = emptyTraits();
    for (const t of SIM_TRAITS) c[t] = rng.normal(0, sd(t, 'c'));
    return c;
  };

  function makeAnimal(p: {
    breed: Breed; sex: Sex; variety: string; born: string | null; sire: SimAnimal | null; dam: SimAnimal | null; line: string;
    kind: SimAnimal['kind']; breeder: string | null; litter: SimLitter | null; earId: string; common: TraitValues;
    /** Base-population mean of the type traits' breeding values (outside stubs only). */
    baseMean?: number;
  }): SimAnimal {
    const bv = emptyTraits();
    const phenotype = emptyTraits();
    for (const t of SIM_TRAITS) {
      // Parents' mean plus Mendelian sampling with variance ½σ²a (parents' inbreeding ignored);
      // an animal without recorded parents draws from the base population, variance σ²a.
      const parentMean = p.sire && p.dam ? (p.sire.bv[t] + p.dam.bv[t]) / 2 : t === 'weight_12w' ? 0 : p.baseMean ?? 0;
      const mendelianSd = p.sire && p.dam ? sd(t, 'a') * Math.SQRT1_2 : sd(t, 'a');
      bv[t] = parentMean + rng.normal(0, mendelianSd);
      phenotype[t] = bv[t] + p.common[t] + rng.normal(0, sd(t, 'e'));
    }
    const a: SimAnimal = {
      rabbitry: plan.slug, breed: p.breed, earId: p.earId, name: null, sex: p.sex, variety: p.variety, born: p.born,
      sire: p.sire, dam: p.dam, line: p.line, kind: p.kind, breeder: p.breeder, litter: p.litter,
      generation: p.sire && p.dam ? 1 + Math.max(p.sire.generation, p.dam.generation) : p.kind === 'stub' ? 0 : 1,
      bv, phenotype, growthScale: 1 + SIMULATION.weightCv * phenotype.weight_12w, merit: typeMerit(p.breed, phenotype),
      arrived: null, exit: null, keeper: false, breederScore: null, registrationNo: null, grandChampion: false,
      stubWeightGrams: null, weighings: [], evaluation: null,
      schedule: { weighOn: null, earlySaleOn: null, evaluateOn: null, decideOn: null, registerOn: null, retireOn: null },
      breeding: { pregnant: false, lastKindled: null, restUntil: null },
    };
    animals.push(a);
    return a;
  }

  function makeKeeper(a: SimAnimal, on: string) {
    a.keeper = true;
    a.name ??= nextName();
    a.schedule.retireOn = addDays(a.born ?? on, rng.int(800, 1200));
    a.schedule.registerOn = addDays(on, rng.int(30, 75));
  }

  function leave(a: SimAnimal, date: string, status: Exclude<AnimalStatus, 'active'>) {
    if (a.exit) return;
    a.exit = { date, status };
    a.breeding.pregnant = false;
  }

  /** Breeders favour a breed's first-listed (commoner) varieties. */
  function popularVariety(breed: Breed): string {
    return breed.varieties[rng.weighted(breed.varieties.map((_, i) => (i + 1) ** -1.5))]!;
  }

  function initials(breeder: string) {
    return breeder.split(/\s+/).map((w) => w[0]!.toUpperCase()).join('').slice(0, 2);
  }

  // Founders and their outside stub parents: per breed, two outside breeders, each with two
  // bucks and two does; founders of one breeder are often half or full siblings.
  for (const unit of plan.units) {
    const breed = breeds.find((b) => b.key === unit.breed)!;
    const stubs: { bucks: SimAnimal[]; does: SimAnimal[] }[] = [];
    unit.founderBreeders.forEach((breederName, bi) => {
      const stubId = () => {
        let id: string;
        do id = `${initials(breederName)}${rng.int(10, 99)}`; while (usedEarIds.has(id));
        usedEarIds.add(id);
        return id;
      };
      const stub = (sex: Sex) => {
        const s = makeAnimal({
          breed, sex, variety: popularVariety(breed), born: null, sire: null, dam: null, line: unit.lines[bi]!,
          kind: 'stub', breeder: breederName, litter: null, earId: stubId(), common: commonEffects(),
          baseMean: SIMULATION.founderLineTypeMeans[bi],
        });
        s.name = nextName();
        // An outside breeder's adult is shown in condition: near the ideal, scaled down from its curve.
        s.stubWeightGrams = Math.round(matureWeight(breed, sex) * (1 + 0.35 * (s.growthScale - 1)));
        s.registrationNo = rng.chance(0.5) ? `R${rng.int(18, 21)}-${String(registrationCounter.next++).padStart(4, '0')}` : null;
        return s;
      };
      stubs[bi] = { bucks: [stub('buck'), stub('buck')], does: [stub('doe'), stub('doe')] };
    });
    for (let i = 0; i < unit.bucks + unit.does; i++) {
      const bi = i % 2;
      const sire = rng.pick(stubs[bi]!.bucks);
      const dam = rng.pick(stubs[bi]!.does);
      const f = makeAnimal({
        breed, sex: i < unit.bucks ? 'buck' : 'doe',
        variety: rng.chance(0.8) ? rng.pick([sire.variety, dam.variety]) : popularVariety(breed),
        born: addDays('2021-06-01', rng.int(0, 75)), sire, dam, line: unit.lines[bi]!, kind: 'founder',
        breeder: unit.founderBreeders[bi]!, litter: null, earId: nextEarId(), common: commonEffects(),
      });
      f.arrived = addDays(SIMULATION.herdStart, rng.int(0, 21));
      f.schedule.weighOn = f.arrived;
      const evalAge = addDays(f.born!, rng.int(120, 150));
      f.schedule.evaluateOn = evalAge > f.arrived ? evalAge : addDays(f.arrived, rng.int(7, 21));
      makeKeeper(f, f.arrived);
      f.schedule.registerOn = null;
      if (rng.chance(0.6)) f.registrationNo = `R21-${String(registrationCounter.next++).padStart(4, '0')}`;
    }
  }

  const unitOf = (a: SimAnimal) => plan.units.find((u) => u.breed === a.breed.key)!;
  const breedingAge = (b: Breed) => SIMULATION.breedingAgeDays[sizeClass(b)];

  function evaluate(a: SimAnimal, date: string) {
    const scores: Record<string, number> = {};
    const notes: string[] = [];
    for (const trait of a.breed.evaluationTemplate.traits) {
      const z = a.phenotype[trait.key as SimTrait] ?? 0;
      const raw = trait.points * (SIMULATION.scoreMeanFraction + SIMULATION.scoreSdFraction * z);
      scores[trait.key] = Math.min(trait.points, Math.max(0, Math.round(raw * 2) / 2));
      if (z > 1.6) notes.push(`strong ${trait.label.toLowerCase()}`);
      if (z < -1.6) notes.push(`weak ${trait.label.toLowerCase()}`);
    }
    const evaluator = mentor && rng.chance(0.2) ? mentor : owner;
    a.evaluation = { date, evaluator, scores, notes: notes.length > 0 ? notes.join('; ') : null };
  }

  function projectedWeightPenalty(a: SimAnimal): number {
    const limits = a.breed.weightLimits[a.sex].senior;
    const projected = matureWeight(a.breed, a.sex) * a.growthScale;
    if (limits.maxGrams !== null && projected > limits.maxGrams) return -12;
    if (limits.minGrams !== null && projected < limits.minGrams) return -6;
    return 0;
  }

  function decide(a: SimAnimal, date: string) {
    const total = a.evaluation ? Object.values(a.evaluation.scores).reduce((s, v) => s + v, 0) : 70 + 10 * a.merit;
    a.breederScore = total + projectedWeightPenalty(a) + rng.normal(0, 3);
    const unit = unitOf(a);
    const target = a.sex === 'doe' ? unit.does : unit.bucks;
    // Breeders already due to leave do not count.
    const breeders = animals.filter((b) => b.keeper && b.sex === a.sex && b.breed === a.breed && b.exit === null && isInHerd(b, date));
    if (breeders.length < target + 1) {
      makeKeeper(a, date);
      return;
    }
    const replaceable = breeders.filter((b) => b.born && b.breederScore !== null && daysBetween(b.born, date) > 270);
    const worst = replaceable.reduce<SimAnimal | null>((w, b) => (w === null || b.breederScore! < w.breederScore! ? b : w), null);
    if (worst && a.breederScore > worst.breederScore!) {
      makeKeeper(a, date);
      leave(worst, addDays(date, rng.int(0, 14)), 'sold');
      return;
    }
    leave(a, addDays(date, rng.int(0, 21)), rng.chance(0.08) ? 'culled' : 'sold');
  }

  function pedigreeNode(a: SimAnimal | null, on: string): PedigreeNode | null {
    if (!a) return null;
    return {
      earId: a.earId,
      variety: a.variety,
      weightGrams: a.kind === 'stub' ? a.stubWeightGrams : latestWeighing(a, on)?.grams ?? null,
      sire: pedigreeNode(a.sire, on),
      dam: pedigreeNode(a.dam, on),
    };
  }

  function register(a: SimAnimal, date: string) {
    if (a.registrationNo) return;
    const readiness = registrationReadiness(
      { birthDate: a.born, sex: a.sex, latestWeightGrams: latestWeighing(a, date)?.grams ?? null, sire: pedigreeNode(a.sire, date), dam: pedigreeNode(a.dam, date) },
      a.breed,
      date,
    );
    if (readiness.ready && rng.chance(0.75)) {
      a.registrationNo = `R${date.slice(2, 4)}-${String(registrationCounter.next++).padStart(4, '0')}`;
    }
  }

  function chooseBuck(doe: SimAnimal, date: string): SimAnimal | null {
    const candidates = animals.filter(
      (b) =>
        b.keeper && b.sex === 'buck' && b.breed === doe.breed && isInHerd(b, date) && b.born !== null &&
        daysBetween(b.born, date) >= breedingAge(b.breed) - 14 &&
        doe.sire !== b && b.sire !== doe && b.dam !== doe &&
        !(doe.sire !== null && doe.sire === b.sire && doe.dam === b.dam),
    );
    if (candidates.length === 0) return null;
    const ranked = (list: SimAnimal[]) =>
      list.map((b) => ({ b, s: (b.breederScore ?? 75) + rng.normal(0, 4) })).sort((x, y) => y.s - x.s)[0]!.b;
    // Line breeding: now and then a deliberately close mating (half sibs, or grandsire × granddaughter).
    const shares = (x: SimAnimal | null, y: SimAnimal | null) => x !== null && x === y;
    const close = candidates.filter(
      (b) => shares(b.sire, doe.sire) !== shares(b.dam, doe.dam) || b === doe.sire?.sire || b === doe.dam?.sire,
    );
    if (close.length > 0 && rng.chance(0.2)) return ranked(close);
    const sameLine = candidates.filter((b) => b.line === doe.line);
    if (sameLine.length > 0 && rng.chance(0.65)) return ranked(sameLine);
    return ranked(candidates);
  }

  function litterCode(date: string): string {
    const year = date.slice(2, 4);
    const n = (litterCounts.get(year) ?? 0) + 1;
    litterCounts.set(year, n);
    return `${plan.earPrefix}-${year}${String(n).padStart(2, '0')}`;
  }

  function gestationDays(): number {
    // Centred on 31–32 days within 29–35 (common practice, no source).
    return GESTATION_DAYS.earliest + rng.weighted([3, 12, 30, 30, 15, 7, 3]);
  }

  function kindle(doe: SimAnimal, litter: SimLitter, on: string) {
    doe.breeding.pregnant = false;
    doe.breeding.lastKindled = on;
    litter.kindledOn = on;
    const mean = SIMULATION.meanLitterBornAlive[doe.breed.key] ?? 5;
    const bornAlive = Math.max(0, 1 + rng.poisson(mean - 1) - (rng.chance(0.05) ? 1 : 0));
    litter.bornAlive = bornAlive;
    litter.bornDead = rng.poisson(0.35);
    const weanOn = addDays(on, rng.int(42, 56));
    const kits: SimAnimal[] = [];
    for (let i = 0; i < bornAlive; i++) {
      if (!rng.chance(SIMULATION.preWeaningSurvival)) continue;
      const kit = makeAnimal({
        breed: doe.breed, sex: rng.chance(0.5) ? 'buck' : 'doe',
        variety: rng.chance(0.92) ? rng.pick([litter.sire.variety, doe.variety]) : popularVariety(doe.breed),
        born: on, sire: litter.sire, dam: doe, line: litter.sire.line, kind: 'bred', breeder: null, litter,
        earId: '', common: litter.commonEffect,
      });
      kits.push(kit);
    }
    if (addDays(on, 21) <= LAST_DAY && kits.length > 0) {
      const total = kits.reduce((s, k) => s + meanWeightAt(k.breed, k.sex, 21) * k.growthScale, 0);
      litter.weight21dGrams = Math.round(total);
    }
    if (weanOn > LAST_DAY) {
      // Not weaned by the end of the records: the kits are not tattooed or listed yet.
      animals.splice(animals.length - kits.length, kits.length);
      return;
    }
    litter.weaned = kits.length;
    for (const kit of kits) {
      kit.earId = nextEarId();
      kit.arrived = weanOn;
      kit.schedule.weighOn = weanOn;
      if (rng.chance(kit.growthScale < 1 ? 0.32 : 0.14)) kit.schedule.earlySaleOn = addDays(on, rng.int(70, 91));
      kit.schedule.evaluateOn = addDays(on, rng.int(120, 150));
      kit.schedule.decideOn = addDays(on, rng.int(155, 175));
      if (rng.chance(0.25)) kit.name = nextName();
    }
  }

  function weigh(a: SimAnimal, date: string) {
    if (a.born) {
      const grams = modelWeight(a, date) * (1 + rng.normal(0, SIMULATION.weighingNoise));
      a.weighings.push({ date, grams: Math.round(grams) });
      const age = daysBetween(a.born, date);
      a.schedule.weighOn = addDays(date, age < 183 ? rng.pick([7, 7, 14]) : rng.int(28, 63));
    } else {
      a.schedule.weighOn = null;
    }
  }

  // Read through a function: leave() changes a.exit behind the type checker's narrowing.
  const leavesOn = (a: SimAnimal) => a.exit?.date ?? '9999-12-31';
  const hasLeft = (a: SimAnimal) => a.exit !== null;
  const due = (when: string | null, weekEnd: string) => when !== null && when < weekEnd && when <= LAST_DAY;

  for (let week = SIMULATION.herdStart; week <= LAST_DAY; week = addDays(week, 7)) {
    const weekEnd = addDays(week, 7);
    // Kindlings due this week.
    for (let i = pending.length - 1; i >= 0; i--) {
      const p = pending[i]!;
      if (p.kindleOn < weekEnd) {
        pending.splice(i, 1);
        if (p.kindleOn <= LAST_DAY && isInHerd(p.doe, p.kindleOn)) kindle(p.doe, p.litter, p.kindleOn);
        else p.doe.breeding.pregnant = false;
      }
    }
    for (const a of [...animals]) {
      if (a.kind === 'stub' || !a.arrived || a.exit) continue;
      if (a.arrived >= weekEnd) continue;
      if (rng.chance(0.0012)) leave(a, addDays(week, rng.int(0, 6)), 'deceased');
      const s = a.schedule;
      if (!a.keeper && due(s.earlySaleOn, weekEnd)) leave(a, s.earlySaleOn!, 'sold');
      if (a.keeper && due(s.retireOn, weekEnd)) leave(a, s.retireOn!, rng.chance(0.6) ? 'sold' : 'deceased');
      while (due(s.weighOn, weekEnd) && s.weighOn! < leavesOn(a)) weigh(a, s.weighOn!);
      if (hasLeft(a)) continue;
      if (due(s.evaluateOn, weekEnd)) {
        evaluate(a, s.evaluateOn!);
        s.evaluateOn = null;
      }
      if (due(s.decideOn, weekEnd)) {
        decide(a, s.decideOn!);
        s.decideOn = null;
      }
      if (a.keeper && due(s.registerOn, weekEnd)) {
        register(a, s.registerOn!);
        s.registerOn = null;
      }
    }
    // Matings (fewer in the summer heat and midwinter).
    if (week > SIMULATION.lastBreeding) continue;
    const month = Number(week.slice(5, 7));
    const season = month === 7 || month === 8 ? 0.35 : month === 12 || month === 1 ? 0.7 : 1;
    for (const doe of animals) {
      if (doe.sex !== 'doe' || !doe.keeper || !isInHerd(doe, week) || doe.breeding.pregnant || !doe.born) continue;
      const age = daysBetween(doe.born, week);
      if (age < breedingAge(doe.breed) || age > 1300) continue;
      if (doe.breeding.lastKindled && daysBetween(doe.breeding.lastKindled, week) < 49) continue;
      if (doe.breeding.restUntil && week < doe.breeding.restUntil) continue;
      if (!rng.chance(SIMULATION.weeklyBreedingChance * season)) continue;
      const buck = chooseBuck(doe, week);
      if (!buck) continue;
      const bredOn = addDays(week, rng.int(0, 6));
      const litter: SimLitter = {
        code: litterCode(bredOn), sire: buck, dam: doe, bredOn, kindledOn: null, bornAlive: null, bornDead: null,
        weaned: null, weight21dGrams: null, notes: null, commonEffect: commonEffects(),
      };
      litters.push(litter);
      if (rng.chance(SIMULATION.conceptionRate)) {
        doe.breeding.pregnant = true;
        pending.push({ doe, litter, kindleOn: addDays(bredOn, gestationDays()) });
      } else {
        litter.notes = 'missed';
        doe.breeding.restUntil = addDays(bredOn, 14);
      }
    }
  }
  // Matings still pending at the end stay open litters (bred, not yet kindled).
  return { rabbitry: plan, animals, litters };
}
