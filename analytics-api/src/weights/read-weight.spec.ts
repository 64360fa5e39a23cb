import { describe, expect, it } from 'vitest';
import { readWeight } from './read-weight';

describe('readWeight', () => {
  // 5 lb 12 oz = 5 × 453.59237 + 12 × 28.349523125 = 2608.156 g → 2608 (NIST Handbook 44, App. C).
  it('reads lb-oz and the shorthand with the lb-oz setting', () => {
    expect(readWeight('5 lb 12 oz', 'lb-oz', 'weight')).toBe(2608);
    expect(readWeight('5-12', 'lb-oz', 'weight')).toBe(2608);
  });
  it('refuses what the parser refuses, with its message under the field', () => {
    expect(() => readWeight('5-12', 'kg', 'weight')).toThrow(/shorthand pounds-ounces works only with the lb-oz/);
    try {
      readWeight('2.6', 'kg', 'weight');
      expect.unreachable();
    } catch (e) {
      expect((e as { status: number }).status).toBe(400);
      expect((e as { details: Record<string, string> }).details.weight).toMatch(/has no unit/);
    }
  });
});
