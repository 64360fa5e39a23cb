import { describe, expect, it } from 'vitest';
import { litterProblems } from './litter-problems';

const ok = { bredOn: '2026-03-01', kindledOn: '2026-04-01', bornAlive: 6, weaned: 5, kitsRecorded: 0 };

describe('litterProblems', () => {
  it('accepts a consistent litter', () => {
    expect(litterProblems(ok)).toEqual({});
    expect(litterProblems({ ...ok, weaned: 6 })).toEqual({});
  });
  it('refuses more weaned than born alive, and weaned without born alive', () => {
    expect(litterProblems({ ...ok, weaned: 7 })).toEqual({ weaned: '7 weaned is more than the 6 born alive' });
    expect(litterProblems({ ...ok, bornAlive: null })).toHaveProperty('bornAlive');
  });
  it('refuses a kindling before the breeding, and fewer born alive than kits recorded', () => {
    expect(litterProblems({ ...ok, kindledOn: '2026-02-28' })).toHaveProperty('kindledOn');
    expect(litterProblems({ ...ok, kitsRecorded: 7, weaned: null })).toEqual({ bornAlive: '7 kits of this litter are recorded, more than 6 born alive' });
  });
});
