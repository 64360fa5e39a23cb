import type { KeepersReport, TraitInfo } from '../contracts/analytics';
import { formatWeight, type UnitSetting } from '../units/weight';
import { ordinal } from './ordinal';

export type KeeperCandidate = KeepersReport['candidates'][number];
type Contribution = KeeperCandidate['components'][number];

/**
 * A standardised score in words, relative to the juniors compared (z already points the way
 * that is better, so for inbreeding a positive z means less inbred than the others).
 */
export function standing(z: number): 'strong' | 'good' | 'average' | 'below-average' | 'weak' {
  if (z >= 1) return 'strong';
  if (z >= 0.25) return 'good';
  if (z > -0.25) return 'average';
  if (z > -1) return 'below-average';
  return 'weak';
}

const percent = (v: number, digits = 0) => `${v.toFixed(digits)} %`;

/** The projected senior weight, how far from the breed's ideal, in the reader's unit. */
function projectedWords(c: KeeperCandidate, unit: UnitSetting): string | null {
  const p = c.projectedSeniorWeight;
  if (!p) return null;
  const grams = formatWeight(Math.max(0, p.grams), unit);
  const away = c.components.find((x) => x.component === 'weightOnTarget')?.value;
  const fromIdeal = p.check?.gramsFromIdeal;
  if (p.check?.status === 'on-ideal') return `projected senior weight ${grams}, on the ideal`;
  if (away == null || fromIdeal == null) return `projected senior weight ${grams}`;
  return `projected senior weight ${grams}, ${percent(Math.abs(away))} ${fromIdeal < 0 ? 'under' : 'over'} the ideal`;
}

/** One component's part of the explanation, in a breeder's words. */
export function componentWords(part: Contribution, c: KeeperCandidate, trait: TraitInfo, unit: UnitSetting): string {
  const { value, z } = part;
  const level = standing(z);
  switch (part.component) {
    case 'breedingValue':
      return value === null
        ? `no breeding value for ${trait.label.toLowerCase()} yet (counted as average)`
        : `${level} breeding value for ${trait.label.toLowerCase()}`;
    case 'ownEvaluation':
      return value === null ? 'not evaluated yet (counted as average)' : `your evaluation ${percent(value)} of the points (${level} for this group)`;
    case 'weightOnTarget':
      return projectedWords(c, unit) ?? 'no projected senior weight yet (counted as average)';
    case 'parentsPlacementIndex':
      if (value === null) return 'parents without show results in classes of more than 3 (counted as average)';
      return `parents' offspring place ${value >= 1.05 ? 'above' : value <= 0.95 ? 'below' : 'about as'} chance (index ${value.toFixed(2)})`;
    case 'inbreeding':
      if (value === null) return 'inbreeding unknown (counted as average)';
      if (value === 0) return 'not inbred';
      return `inbreeding ${percent(100 * value, 1)} (${z > 0 ? 'less' : z < 0 ? 'more' : 'as much'} than the others)`;
  }
}

/**
 * Why a junior stands where it does, as sentences a breeder reads: its rank, the three
 * components that moved it most (largest |weight × z| first), those counted as average for
 * want of records, then each disqualification risk — e.g. "Ranked 3rd of 12: strong breeding
 * value for weight at 12 weeks; projected senior weight 6 lb 2 oz, 3 % under the ideal;
 * parents' offspring place above chance (index 1.40)." Weights in the reader's unit. O(k log k)
 * for k components.
 */
export function explainKeeper(c: KeeperCandidate, all: readonly Pick<KeeperCandidate, 'rank'>[], trait: TraitInfo, unit: UnitSetting): string[] {
  const tied = all.filter((o) => o.rank === c.rank).length > 1;
  const head = `Ranked ${ordinal(c.rank)}${tied ? ' (tied)' : ''} of ${all.length}`;
  const moved = c.components
    .filter((p) => p.contribution !== 0)
    .sort((a, b) => Math.abs(b.contribution) - Math.abs(a.contribution))
    .slice(0, 3);
  const parts = moved.map((p) => componentWords(p, c, trait, unit));
  const missing = c.components.filter((p) => p.value === null && p.weight !== 0).map((p) => componentWords(p, c, trait, unit));
  const said = [...parts, ...missing.filter((m) => !parts.includes(m))];
  const body = said.length ? `: ${said.join('; ')}.` : ': every weighted component is at the average of these juniors.';
  return [head + body, ...c.weightFlags.filter((f) => f.disqualificationRisk).map((f) => f.message)];
}
