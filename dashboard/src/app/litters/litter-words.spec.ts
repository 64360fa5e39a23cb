import { kindlingWindow } from '@shared/domain/gestation';
import { expectedText, kitEarIds, litterState, rangeText, weight21dText } from './litter-words';

// Gestation 29–35 days, usually 31–32 (common practice, as in the design): bred 2026-11-10 →
// earliest 12-09, expected 12-11 to 12-12, latest 12-15.
const bred = { kindledOn: null, kindlingWindow: kindlingWindow('2026-11-10') };

describe('litter words', () => {
  it('gives the expected days and the whole range', () => {
    expect(expectedText(bred)).toBe('2026-12-11 – 12-12');
    expect(rangeText(bred)).toBe('range 2026-12-09 to 2026-12-15');
    expect(expectedText({ kindlingWindow: kindlingWindow('2026-11-30') })).toBe('2026-12-31 – 2027-01-01');
    expect(expectedText(bred, false)).toBe('12-11 – 12-12');
  });

  it('says where a bred doe stands', () => {
    expect(litterState(bred, '2026-11-30')).toBe('due in 11 days');
    expect(litterState(bred, '2026-12-09')).toBe('due now');
    expect(litterState(bred, '2026-12-15')).toBe('due now');
    expect(litterState(bred, '2026-12-16')).toBe('no kindling recorded');
    expect(litterState({ ...bred, kindledOn: '2026-12-11' }, '2026-12-20')).toBe('');
    expect(litterState({ kindledOn: null, kindlingWindow: null }, '2026-12-20')).toBe('');
  });

  it('shows the 21-day litter weight in the user’s unit', () => {
    // 1134 g / 28.349523125 g per oz (NIST Handbook 44) = 40.0 oz = 2 lb 8 oz.
    expect(weight21dText({ weight21dGrams: 1134 }, 'lb-oz')).toBe('2 lb 8 oz');
    expect(weight21dText({ weight21dGrams: null }, 'kg')).toBe('');
  });

  it('previews the kits’ ear IDs', () => {
    expect(kitEarIds('BF-2301-', 3, 3)).toEqual(['BF-2301-3', 'BF-2301-4', 'BF-2301-5']);
    expect(kitEarIds('X', 1, 0)).toEqual([]);
  });
});
