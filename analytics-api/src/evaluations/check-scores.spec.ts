import { describe, expect, it } from 'vitest';
import { DEFAULT_EVALUATION_TRAITS } from '@shared/domain/breed';
import { checkScores } from './check-scores';

// Keeperline's own default template (shared/domain/breed): body type carries 35 points, fur 20.
describe('checkScores', () => {
  it('accepts scores up to each trait\'s points', () => {
    expect(checkScores({ body_type: 35, fur: 0 }, DEFAULT_EVALUATION_TRAITS)).toEqual({});
  });
  it('names a trait scored above its points and a key outside the template', () => {
    const p = checkScores({ body_type: 36, wings: 3 }, DEFAULT_EVALUATION_TRAITS);
    expect(p.body_type).toBe('Body type: 36 is more than the 35 points the trait carries');
    expect(p.wings).toMatch(/^wings is not a trait of this breed's evaluation template/);
  });
});
