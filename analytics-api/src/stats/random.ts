/**
 * Deterministic pseudo-random numbers for simulations, tests, benchmarks and the demo data.
 *
 * mulberry32: a 32-bit state generator by Tommy Ettinger (public domain, 2017), period 2^32,
 * good enough for simulation (not for anything secret). O(1) per draw.
 *
 * @param seed any number; its low 32 bits are the state
 * @returns a function returning uniform numbers in [0, 1)
 */
export function mulberry32(seed: number): () => number {
  let state = seed | 0;
  return () => {
    state = (state + 0x6d2b79f5) | 0;
    let t = Math.imul(state ^ (state >>> 15), 1 | state);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * A standard normal deviate by the Box–Muller transform (Box & Muller 1958):
 * z = √(−2 ln u₁) · cos(2π u₂). O(1); uses two uniforms per call.
 */
export function randomNormal(rng: () => number): number {
  const u1 = 1 - rng(); // in (0, 1], keeps the logarithm finite
  const u2 = rng();
  return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
}
