import { formatInbreeding, inbreedingBand } from './inbreeding-bands';

describe('inbreedingBand', () => {
  // Offspring inbreeding of familiar matings, Falconer & Mackay (1996) ch. 5 (from memory):
  // first cousins 1/16, half sibs 1/8, full sibs 1/4, full sibs of full-sib parents 3/8.
  it.each([
    [0, 'None'],
    [1 / 64, 'Under 6.25 %'],
    [1 / 16, '6.25–12.5 %'],
    [1 / 8, '12.5–25 %'],
    [1 / 4, '25 % and over'],
    [3 / 8, '25 % and over'],
  ])('puts F = %s in the band %s (cuts belong to the band above)', (f, label) => {
    expect(inbreedingBand(f).label).toBe(label);
  });

  it('agrees with the API levels none / low / moderate / high at their cuts', () => {
    expect([0, 0.03, 0.07, 0.13].map((f) => inbreedingBand(f).index)).toEqual([0, 1, 2, 3]);
  });

  it('refuses NaN', () => {
    expect(() => inbreedingBand(Number.NaN)).toThrow('inbreedingBand requires a number');
  });
});

describe('formatInbreeding', () => {
  it('writes percentages with one decimal, two below 1 %', () => {
    expect(formatInbreeding(0.3046875)).toBe('30.5 %');
    expect(formatInbreeding(1 / 256)).toBe('0.39 %');
    expect(formatInbreeding(0)).toBe('0 %');
  });
});
