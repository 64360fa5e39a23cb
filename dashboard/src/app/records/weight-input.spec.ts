import { FormControl } from '@angular/forms';
import { weightEcho, weightValidator } from './weight-input';

// Grams from the exact pound 453.59237 g and ounce 28.349523125 g (NIST Handbook 44, Appendix C):
// 5 lb 12 oz = 5.75 × 453.59237 = 2608.156 g → 2608 g.
describe('weight input', () => {
  it('accepts what the API accepts and refuses with the parser’s message', () => {
    const lbOz = new FormControl('5-12', weightValidator(() => 'lb-oz'));
    expect(lbOz.errors).toBeNull();
    lbOz.setValue('5.2');
    expect(lbOz.errors?.['message']).toContain('has no unit');
    lbOz.setValue('5 lb 17 oz');
    expect(lbOz.errors?.['message']).toContain('ounces must be under 16');

    const kg = new FormControl('5-12', weightValidator(() => 'kg'));
    expect(kg.errors?.['message']).toContain('works only with the lb-oz unit setting');
    kg.setValue('2.6 kg');
    expect(kg.errors).toBeNull();
  });

  it('requires a weight only where asked', () => {
    expect(new FormControl('', weightValidator(() => 'kg')).errors?.['message']).toBe('Give the weight, e.g. "2.6 kg" or "2600 g"');
    expect(new FormControl('', weightValidator(() => 'kg', false)).errors).toBeNull();
  });

  it('says back what will be stored', () => {
    expect(weightEcho('5-12', 'lb-oz')).toBe('= 5 lb 12 oz (2608 g)');
    expect(weightEcho('2600 g', 'kg')).toBe('= 2.60 kg (2600 g)');
    expect(weightEcho('5', 'kg')).toBe('');
  });
});
