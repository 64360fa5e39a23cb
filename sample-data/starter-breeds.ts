import { type Breed, DEFAULT_EVALUATION_TRAITS, type EvaluationTrait, type WeightLimits } from '../shared/domain/breed';
import { GRAMS_PER_POUND } from '../shared/units/weight';

/**
 * The starter breed catalogue shipped with the demo. Every number is from memory and marked so;
 * an admin checks it against the current official standard before relying on it. The points
 * are Keeperline's own scoring weights for a breeder's evaluations, not any points schedule.
 */
export const FROM_MEMORY = 'from memory — check against the current official standard';
const OWN_WEIGHTS = "Keeperline's own scoring weights for breeder evaluations — not the official points schedule";

const lb = (pounds: number | null) => (pounds === null ? null : Math.round(pounds * GRAMS_PER_POUND));
const limits = (min: number | null, ideal: number | null, max: number | null): WeightLimits => ({
  minGrams: lb(min),
  idealGrams: lb(ideal),
  maxGrams: lb(max),
  source: FROM_MEMORY,
});
const template = (points: Partial<Record<string, number>>) => ({
  traits: DEFAULT_EVALUATION_TRAITS.map((t): EvaluationTrait => ({ ...t, points: points[t.key] ?? t.points })),
  source: OWN_WEIGHTS,
});

export const STARTER_BREEDS: Breed[] = [
  {
    key: 'mini-rex',
    name: 'Mini Rex',
    classScheme: 'four-class',
    varieties: ['Black', 'Blue', 'Broken', 'Castor', 'Lynx', 'Opal', 'Red', 'Ruby-Eyed White'],
    weightLimits: {
      buck: { junior: limits(null, null, 3.5), intermediate: null, senior: limits(3, 4, 4.5) },
      doe: { junior: limits(null, null, 3.5), intermediate: null, senior: limits(3.25, 4.25, 4.5) },
    },
    evaluationTemplate: template({ body_type: 30, fur: 25 }),
    source: FROM_MEMORY,
  },
  {
    key: 'holland-lop',
    name: 'Holland Lop',
    classScheme: 'four-class',
    varieties: ['Solid', 'Broken'],
    weightLimits: {
      buck: { junior: limits(null, null, 3.5), intermediate: null, senior: limits(null, 3, 4) },
      doe: { junior: limits(null, null, 3.5), intermediate: null, senior: limits(null, 3, 4) },
    },
    evaluationTemplate: template({ body_type: 35, head: 15, ears_crown: 15, fur: 10 }),
    source: FROM_MEMORY,
  },
  {
    key: 'mini-lop',
    name: 'Mini Lop',
    classScheme: 'four-class',
    varieties: ['Solid', 'Broken'],
    weightLimits: {
      buck: { junior: limits(null, null, 5.5), intermediate: null, senior: limits(5, 6, 6.5) },
      doe: { junior: limits(null, null, 5.75), intermediate: null, senior: limits(5.25, 6.5, 7) },
    },
    evaluationTemplate: template({}),
    source: FROM_MEMORY,
  },
  {
    key: 'californian',
    name: 'Californian',
    classScheme: 'six-class',
    varieties: ['Californian'],
    weightLimits: {
      buck: { junior: limits(3.5, null, 6), intermediate: limits(6, null, 8.5), senior: limits(8, 9, 10) },
      doe: { junior: limits(3.5, null, 6.5), intermediate: limits(6.5, null, 9), senior: limits(8.5, 9.5, 10.5) },
    },
    evaluationTemplate: template({ body_type: 40, fur: 15 }),
    source: FROM_MEMORY,
  },
];
