import { describe, expect, it } from 'vitest';
import { DEFAULT_EVALUATION_TRAITS } from '../domain/breed';
import { traitsToMap } from './traits-to-map';

// Invented templates; the expected unions are worked by hand.
describe('traitsToMap', () => {
  const compact = [{ key: 'body_type', label: 'Body type', points: 50 }, { key: 'fur', label: 'Fur', points: 35 }];
  const marked = [{ key: 'markings', label: 'Markings', points: 25 }, { key: 'fur', label: 'Coat', points: 15 }, { key: 'notes', label: 'Notes', points: 5 }];

  it('takes every key once, with the first label and the highest points', () => {
    expect(traitsToMap([compact, marked])).toEqual([
      { key: 'body_type', label: 'Body type', points: 50 },
      { key: 'fur', label: 'Fur', points: 35 },
      { key: 'markings', label: 'Markings', points: 25 },
    ]);
  });

  it('falls back to the default traits when no breed has a template', () => {
    expect(traitsToMap([])).toEqual(DEFAULT_EVALUATION_TRAITS);
  });
});
