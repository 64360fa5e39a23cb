import type { AnimalProfile } from '@shared/contracts/animals';
import { AGE_CLASS_LABELS } from '@shared/domain/terms';
import { formatWeight, type UnitSetting } from '@shared/units/weight';

export interface WeightFlag {
  tone: 'risk' | 'ok' | 'info';
  text: string;
}

/**
 * The latest weighing against the breed's limits for its age class, in words. Over the maximum
 * or under the minimum a judge may disqualify (common practice; the show's rules decide).
 * Cost O(1).
 */
export function weightFlag(check: NonNullable<AnimalProfile['weightCheck']>, unit: UnitSetting): WeightFlag {
  const w = (g: number) => formatWeight(g, unit);
  const lead = `Latest weight ${w(check.grams)} on ${check.weighedOn} (${AGE_CLASS_LABELS[check.ageClass].toLowerCase()})`;
  const limits = check.limits;
  switch (check.status) {
    case 'over-maximum':
      return { tone: 'risk', text: `${lead} is over the maximum of ${w(limits!.maxGrams!)}: disqualification risk.` };
    case 'under-minimum':
      return { tone: 'risk', text: `${lead} is under the minimum of ${w(limits!.minGrams!)}: disqualification risk.` };
    case 'on-ideal':
      return { tone: 'ok', text: `${lead} is on the ideal weight of ${w(limits!.idealGrams!)}.` };
    case 'within-limits': {
      const range = [limits?.minGrams, limits?.maxGrams].some((g) => g !== null && g !== undefined)
        ? ` (${limits?.minGrams ? w(limits.minGrams) : 'no minimum'} to ${limits?.maxGrams ? w(limits.maxGrams) : 'no maximum'})`
        : '';
      const fromIdeal = check.gramsFromIdeal === null ? ''
        : `, ${w(Math.abs(check.gramsFromIdeal))} ${check.gramsFromIdeal > 0 ? 'over' : 'under'} the ideal`;
      return { tone: 'ok', text: `${lead} is within the limits${range}${fromIdeal}.` };
    }
    case 'no-limits':
      return { tone: 'info', text: `${lead}: the breed catalogue gives no limits for this class.` };
  }
}
