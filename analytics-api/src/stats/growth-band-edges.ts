export interface GrowthBandEdgesOptions {
  /** width of the bands while young (default 7) */
  fineDays?: number;
  /** fine bands up to this age (default 182, 26 weeks: a junior's whole class) */
  fineUntilDays?: number;
  /** beyond, blocks of this width (default 28) are joined into bands */
  blockDays?: number;
  /** until a band holds this many weighings (default 20, the LMS fit's minimum) … */
  minBandSize?: number;
  /** … but no band grows wider than this (default 112, 16 weeks) */
  maxBandDays?: number;
  /** no band reaches past this age (default 728, two years) */
  untilDays?: number;
}

export interface GrowthBandEdges {
  /** ascending band edges in days, from 0 */
  edges: number[];
  /** where the weighings became too few to fill a band (the last edge), or null when they filled every band to `untilDays` */
  thinsOutFromDays: number | null;
  /** weighings at or beyond the last edge, left out */
  beyond: number;
}

/**
 * Age bands for a weight-for-age reference that reach as far as the weighings support:
 * `fineDays` bands from birth to `fineUntilDays` (growth is fast; juniors are weighed often),
 * then blocks of `blockDays` joined until a band holds `minBandSize` weighings (adults are
 * weighed seldom, and grow slowly), up to `maxBandDays` wide. The bands stop where the next
 * could not be filled within that width, or at `untilDays`. O(N + B) for N ages.
 *
 * @throws when an option is not positive, fineUntilDays is not a multiple of fineDays, or an age is not finite
 */
export function growthBandEdges(ages: readonly number[], options: GrowthBandEdgesOptions = {}): GrowthBandEdges {
  const { fineDays = 7, fineUntilDays = 182, blockDays = 28, minBandSize = 20, maxBandDays = 112, untilDays = 728 } = options;
  if (![fineDays, fineUntilDays, blockDays, minBandSize, maxBandDays, untilDays].every((v) => v > 0) || fineUntilDays % fineDays !== 0 || untilDays <= fineUntilDays) {
    throw new Error('growthBandEdges requires positive options, fineUntilDays a multiple of fineDays and untilDays beyond it');
  }
  const blocks = Math.ceil((untilDays - fineUntilDays) / blockDays);
  const perBlock = new Array<number>(blocks).fill(0);
  let pastEnd = 0;
  for (const age of ages) {
    if (!Number.isFinite(age)) throw new Error('growthBandEdges requires finite ages');
    if (age < fineUntilDays) continue;
    const k = Math.floor((age - fineUntilDays) / blockDays);
    if (k < blocks) perBlock[k]!++;
    else pastEnd++;
  }
  const edges = Array.from({ length: fineUntilDays / fineDays + 1 }, (_, i) => i * fineDays);
  const edgeOfBlock = (k: number) => Math.min(untilDays, fineUntilDays + k * blockDays);
  let k = 0;
  while (k < blocks) {
    let n = 0;
    let end = k;
    while (end < blocks && n < minBandSize && edgeOfBlock(end + 1) - edgeOfBlock(k) <= maxBandDays) n += perBlock[end++]!;
    if (n < minBandSize) break;
    edges.push(edgeOfBlock(end));
    k = end;
  }
  const beyond = perBlock.slice(k).reduce((s, c) => s + c, 0) + pastEnd;
  return { edges, thinsOutFromDays: k < blocks ? edgeOfBlock(k) : null, beyond };
}
