/**
 * Standard competition ranking ("1224"): the highest score ranks 1, equal scores share the
 * best rank of their group and the next rank skips accordingly. Scores within 1e-9 (relative)
 * count as equal, so rounding noise makes no ranks. O(n log n).
 *
 * @returns the rank of each score, in input order
 */
export function competitionRanks(scores: readonly number[]): number[] {
  const order = scores.map((_, i) => i).sort((a, b) => scores[b] - scores[a]);
  const ranks = new Array<number>(scores.length);
  order.forEach((i, position) => {
    const previous = order[position - 1];
    const tied = position > 0 && Math.abs(scores[previous] - scores[i]) <= 1e-9 * Math.max(1, Math.abs(scores[i]));
    ranks[i] = tied ? ranks[previous] : position + 1;
  });
  return ranks;
}
