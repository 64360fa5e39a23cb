import { describe, expect, it } from 'vitest';
import { parseAwards } from './parse-awards';

describe('parseAwards', () => {
  it('reads space-separated codes, case-insensitively, skipping unknown words', () => {
    expect(parseAwards('BOV  bob XYZ')).toEqual(['BOV', 'BOB']);
    expect(parseAwards('')).toEqual([]);
    expect(parseAwards(null)).toEqual([]);
  });
});
