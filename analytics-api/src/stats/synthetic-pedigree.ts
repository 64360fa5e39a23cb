import { mulberry32 } from './random';

export interface SyntheticPedigreeOptions {
  /** PRNG seed; the same seed and options give the same pedigree. Default 1. */
  seed?: number;
  /** Animals per closed population (a breed: no parent links between populations). Default 25,000. */
  populationSize?: number;
  /** Herds per population, exchanging bucks. Default 8. */
  herdsPerPopulation?: number;
  /** Breeding bucks kept per herd and generation. Default 4. */
  bucksPerHerd?: number;
  /** Breeding does kept per herd and generation. Default 20. */
  doesPerHerd?: number;
  /** Litters per doe and generation. Default 2. */
  littersPerDoe?: number;
  /** Mean litter size (uniform on 1..2·mean−1). Default 7. */
  meanLitterSize?: number;
  /** Share of litters sired by a buck of another herd of the same population. Default 0.1. */
  outsideSireRate?: number;
  /** Share of litters from a close mating: the doe's own sire or a half/full brother. Default 0.05. */
  closeMatingRate?: number;
  /** Share of kits with one parent unrecorded. Default 0.01. */
  unknownParentRate?: number;
}

export interface SyntheticPedigree {
  sire: Int32Array;
  dam: Int32Array;
  /** 0 = buck, 1 = doe */
  sex: Uint8Array;
  herd: Int32Array;
  generation: Int32Array;
}

/**
 * A deterministic invented pedigree of exactly n animals, for tests and benchmarks: closed
 * populations (breeds) of herds; each generation every doe has a few litters, mostly by a
 * buck of her own herd, sometimes by a buck of another herd, sometimes by her sire or a
 * brother (line breeding); the next breeders are drawn from the herd's offspring. Animals
 * are written generation by generation, so parents precede offspring. O(n).
 *
 * @throws when n is not a non-negative integer or an option is out of range
 */
export function syntheticPedigree(n: number, options: SyntheticPedigreeOptions = {}): SyntheticPedigree {
  const {
    seed = 1,
    populationSize = 25_000,
    herdsPerPopulation = 8,
    bucksPerHerd = 4,
    doesPerHerd = 20,
    littersPerDoe = 2,
    meanLitterSize = 7,
    outsideSireRate = 0.1,
    closeMatingRate = 0.05,
    unknownParentRate = 0.01,
  } = options;
  if (!Number.isInteger(n) || n < 0) throw new Error(`syntheticPedigree requires a non-negative integer n (got ${n})`);
  for (const [name, value] of Object.entries({ populationSize, herdsPerPopulation, bucksPerHerd, doesPerHerd, littersPerDoe, meanLitterSize })) {
    if (!Number.isInteger(value) || value < 1) throw new Error(`syntheticPedigree requires ${name} to be a positive integer`);
  }
  for (const [name, value] of Object.entries({ outsideSireRate, closeMatingRate, unknownParentRate })) {
    if (!(value >= 0 && value <= 1)) throw new Error(`syntheticPedigree requires ${name} between 0 and 1`);
  }

  const rng = mulberry32(seed);
  const pick = <T>(items: readonly T[]): T => items[Math.floor(rng() * items.length)];
  const sire = new Int32Array(n).fill(-1);
  const dam = new Int32Array(n).fill(-1);
  const sex = new Uint8Array(n);
  const herd = new Int32Array(n);
  const generation = new Int32Array(n);
  let count = 0;
  let herdBase = 0;

  const add = (s: number, d: number, h: number, g: number): number => {
    sire[count] = s;
    dam[count] = d;
    sex[count] = rng() < 0.5 ? 0 : 1;
    herd[count] = h;
    generation[count] = g;
    return count++;
  };

  while (count < n) {
    const herds = herdsPerPopulation;
    const bucks: number[][] = [];
    const does: number[][] = [];
    const end = Math.min(n, count + populationSize);
    for (let h = 0; h < herds && count < end; h++) {
      bucks.push([]);
      does.push([]);
      for (let b = 0; b < bucksPerHerd && count < end; b++) bucks[h].push(add(-1, -1, herdBase + h, 0));
      for (let f = 0; f < doesPerHerd && count < end; f++) does[h].push(add(-1, -1, herdBase + h, 0));
      for (const b of bucks[h]) sex[b] = 0;
      for (const f of does[h]) sex[f] = 1;
    }
    let roundBucks: number[][] = [];
    for (let g = 1; count < end; g++) {
      roundBucks = bucks.map((b) => b.slice()); // outside sires come from the previous generation
      for (let h = 0; h < bucks.length && count < end; h++) {
        const young: number[] = [];
        for (const doe of does[h]) {
          for (let l = 0; l < littersPerDoe && count < end; l++) {
            const buck = chooseBuck(doe, h);
            const size = 1 + Math.floor(rng() * (2 * meanLitterSize - 1));
            for (let k = 0; k < size && count < end; k++) {
              const unknown = rng() < unknownParentRate;
              const side = rng() < 0.5;
              young.push(add(unknown && side ? -1 : buck, unknown && !side ? -1 : doe, herdBase + h, g));
            }
          }
        }
        // Next breeders: a random draw from this generation's kits; keep old ones when short.
        const youngBucks = young.filter((i) => sex[i] === 0);
        const youngDoes = young.filter((i) => sex[i] === 1);
        if (youngBucks.length >= bucksPerHerd) bucks[h] = sample(youngBucks, bucksPerHerd);
        if (youngDoes.length >= doesPerHerd) does[h] = sample(youngDoes, doesPerHerd);
      }
    }
    herdBase += herds;

    function chooseBuck(doe: number, h: number): number {
      const r = rng();
      if (r < outsideSireRate && bucks.length > 1) {
        let other = Math.floor(rng() * (bucks.length - 1));
        if (other >= h) other++;
        return pick(roundBucks[other]);
      }
      if (r < outsideSireRate + closeMatingRate) {
        const relatives = bucks[h].filter((b) => (sire[b] >= 0 && sire[b] === sire[doe]) || (dam[b] >= 0 && dam[b] === dam[doe]));
        if (sire[doe] >= 0 && (relatives.length === 0 || rng() < 0.5)) return sire[doe];
        if (relatives.length > 0) return pick(relatives);
      }
      return pick(bucks[h]);
    }
  }
  return { sire, dam, sex, herd, generation };

  function sample(items: number[], k: number): number[] {
    const copy = items.slice();
    for (let i = 0; i < k; i++) {
      const j = i + Math.floor(rng() * (copy.length - i));
      [copy[i], copy[j]] = [copy[j], copy[i]];
    }
    return copy.slice(0, k);
  }
}
