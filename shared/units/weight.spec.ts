import { describe, expect, it } from 'vitest';
import { formatWeight, GRAMS_PER_OUNCE, GRAMS_PER_POUND, parseWeight } from './weight';

// Expected grams are computed by hand from the 1959 international definitions
// (1 lb = 453.59237 g, 1 oz = 28.349523125 g; NIST Handbook 44 Appendix C).
describe('weight units (1959 international avoirdupois pound)', () => {
  it('uses the exact definitions', () => {
    expect(GRAMS_PER_POUND).toBe(453.59237);
    expect(GRAMS_PER_OUNCE).toBeCloseTo(28.349523125, 12);
  });

  it.each([
    ['5 lb 12 oz', 2608], // 5.75 × 453.59237 = 2608.156
    ['5lb 12oz', 2608],
    ['5 lbs. 12 oz.', 2608],
    ['5.75 lb', 2608],
    ['12 oz', 340], // 12 × 28.349523125 = 340.194
    ['1 lb', 454], // 453.59237
    ['2.6 kg', 2600],
    ['2600 g', 2600],
    ['6 lb 9 oz', 2977], // 6.5625 × 453.59237 = 2976.700
    ['6 lb 8 oz', 2948], // 6.5 × 453.59237 = 2948.350
  ])('parses %s as %i g', (text, grams) => {
    expect(parseWeight(text, 'lb-oz')).toEqual({ ok: true, grams });
  });

  it('reads the shorthand 5-12 as 5 lb 12 oz only with the lb-oz setting', () => {
    expect(parseWeight('5-12', 'lb-oz')).toEqual({ ok: true, grams: 2608 });
    expect(parseWeight('4-03', 'lb-oz')).toEqual({ ok: true, grams: 1899 }); // 4.1875 lb = 1899.418
    const kg = parseWeight('5-12', 'kg');
    expect(kg.ok).toBe(false);
    if (!kg.ok) expect(kg.message).toContain('only with the lb-oz unit setting');
  });

  it('refuses 16 ounces or more in the shorthand and in "lb oz"', () => {
    expect(parseWeight('5-16', 'lb-oz').ok).toBe(false);
    expect(parseWeight('5 lb 16 oz', 'lb-oz').ok).toBe(false);
    expect(parseWeight('5-15', 'lb-oz').ok).toBe(true);
  });

  it('refuses a bare number and says how to write it', () => {
    const r = parseWeight('5.2', 'lb-oz');
    expect(r).toEqual({
      ok: false,
      message: '"5.2" has no unit. Write the unit: "5 lb 12 oz", "5-12", "2.6 kg" or "2600 g"',
    });
    const k = parseWeight('2600', 'kg');
    expect(k.ok).toBe(false);
    if (!k.ok) expect(k.message).not.toContain('5-12');
  });

  it('refuses zero, negative, empty and unknown text', () => {
    for (const text of ['0 g', '0 lb 0 oz', '-2 kg', '', '   ', 'heavy', '2,6 kg', '0.2 g']) {
      expect(parseWeight(text, 'lb-oz').ok, text).toBe(false);
    }
  });

  it('formats to the nearest ounce, carrying 16 oz into a pound', () => {
    expect(formatWeight(2608, 'lb-oz')).toBe('5 lb 12 oz');
    expect(formatWeight(340, 'lb-oz')).toBe('12 oz');
    // 2 lb 15.9 oz = 47.9 oz × 28.3495 = 1357.94 g rounds up to 48 oz = 3 lb 0 oz.
    expect(formatWeight(1358, 'lb-oz')).toBe('3 lb 0 oz');
    expect(formatWeight(2608, 'kg')).toBe('2.61 kg');
    expect(formatWeight(0, 'kg')).toBe('0.00 kg');
    expect(() => formatWeight(-1, 'kg')).toThrow('formatWeight requires a finite, non-negative number of grams');
  });

  it('reads back what it formats', () => {
    for (const grams of [340, 907, 1899, 2608, 4536]) {
      for (const unit of ['lb-oz', 'kg'] as const) {
        const back = parseWeight(formatWeight(grams, unit), unit);
        expect(back.ok).toBe(true);
        // lb-oz display rounds to the ounce (±14.2 g), kg to 10 g (±5 g).
        if (back.ok) expect(Math.abs(back.grams - grams)).toBeLessThanOrEqual(unit === 'kg' ? 5 : 15);
      }
    }
  });
});
