import type { AnimalLitter } from '@shared/contracts/animals';
import { litterWords } from './litter-words';

const litter = (more: Partial<AnimalLitter>): AnimalLitter => ({
  id: 1, code: 'BF-2601', mate: null, bredOn: null, kindledOn: null, bornAlive: null, bornDead: null, weaned: null, kitsRecorded: 0, ...more,
});

describe('litterWords', () => {
  it('says the dates and counts recorded, and leaves out the rest', () => {
    expect(litterWords(litter({ bredOn: '2026-06-01', kindledOn: '2026-07-02', bornAlive: 5, bornDead: 1, weaned: 5, kitsRecorded: 3 })))
      .toBe('bred 2026-06-01, kindled 2026-07-02 · 5 born alive, 1 dead · 5 weaned · 3 kits recorded');
    expect(litterWords(litter({ bredOn: '2026-06-01' }))).toBe('bred 2026-06-01, not kindled yet');
    expect(litterWords(litter({ kindledOn: '2026-07-02', bornDead: 0, kitsRecorded: 1 }))).toBe('kindled 2026-07-02 · 0 dead · 1 kit recorded');
    expect(litterWords(litter({}))).toBe('');
  });
});
