import { describe, expect, it } from 'vitest';
import { checkPlacing } from './placing';

describe('checkPlacing', () => {
  it('accepts placings 1..entries and rejects others, naming the caller', () => {
    expect(() => checkPlacing(1, 1, 'f')).not.toThrow();
    expect(() => checkPlacing(5, 5, 'f')).not.toThrow();
    expect(() => checkPlacing(0, 5, 'f')).toThrow('f requires placings in 1..entries (got 0 of 5)');
    expect(() => checkPlacing(2.5, 5, 'f')).toThrow(/got 2.5 of 5/);
    expect(() => checkPlacing(1, 0, 'f')).toThrow(/got 1 of 0/);
  });
});
