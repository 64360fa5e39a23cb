import { mulberry32, randomNormal } from '../analytics-api/src/stats/random';

/**
 * The demo generator's random draws, all from one seeded mulberry32 stream (the project's
 * generator in analytics-api/src/stats/random.ts), so a seed always gives the same demo.
 * Each helper is O(1) except poisson (O(λ)) and shuffle (O(n)).
 */
export class Random {
  private readonly next: () => number;

  constructor(seed: number) {
    this.next = mulberry32(seed);
  }

  /** Uniform in [0, 1). */
  uniform(): number {
    return this.next();
  }

  /** Whole number uniform on min..max inclusive. */
  int(min: number, max: number): number {
    return min + Math.floor(this.next() * (max - min + 1));
  }

  normal(mean = 0, sd = 1): number {
    return mean + sd * randomNormal(this.next);
  }

  chance(p: number): boolean {
    return this.next() < p;
  }

  /** @throws `Random.pick requires a non-empty list` */
  pick<T>(items: readonly T[]): T {
    if (items.length === 0) throw new Error('Random.pick requires a non-empty list');
    return items[Math.floor(this.next() * items.length)]!;
  }

  /** Index drawn with probability proportional to its weight. */
  weighted(weights: readonly number[]): number {
    const total = weights.reduce((s, w) => s + w, 0);
    let u = this.next() * total;
    for (let i = 0; i < weights.length; i++) {
      u -= weights[i]!;
      if (u < 0) return i;
    }
    return weights.length - 1;
  }

  /** Poisson count by Knuth's multiplication method (Knuth, TAOCP vol. 2, 3.4.1). */
  poisson(lambda: number): number {
    const limit = Math.exp(-lambda);
    let k = 0;
    let p = this.next();
    while (p > limit) {
      k++;
      p *= this.next();
    }
    return k;
  }

  /** Fisher–Yates shuffle of a copy. */
  shuffle<T>(items: readonly T[]): T[] {
    const out = [...items];
    for (let i = out.length - 1; i > 0; i--) {
      const j = Math.floor(this.next() * (i + 1));
      [out[i], out[j]] = [out[j]!, out[i]!];
    }
    return out;
  }
}
