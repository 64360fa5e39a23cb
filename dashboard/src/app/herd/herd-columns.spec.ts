import type { HerdRow } from '@shared/contracts/animals';
import { HERD_COLUMNS, headerFor, sortFor } from './herd-columns';

const row: HerdRow = {
  id: 1, earId: 'BF101', name: 'Sorrel', sex: 'doe', breedId: 2, breed: 'Mini Rex', variety: 'Castor',
  birthDate: '2026-05-15', ageDays: 199, ageClass: 'senior', line: 'Ember', status: 'active', isStub: false,
  registrationNo: null, latestWeightGrams: 2608, latestWeighedOn: '2026-11-20', legs: 2, grandChampion: false, keeperDecision: null,
};
const cells = (r: HerdRow, unit: 'lb-oz' | 'kg') =>
  Object.fromEntries(HERD_COLUMNS.map((c) => [c.key, c.cell(r, { unit, today: '2026-11-30' })]));

describe('herd columns', () => {
  it('shows a row in words and the user’s unit', () => {
    // 2608 g = 5.75 lb (NIST Handbook 44: 1 lb = 453.59237 g) = 5 lb 12 oz.
    expect(cells(row, 'lb-oz')).toEqual({
      earId: 'BF101', name: 'Sorrel', sex: 'Doe', breed: 'Mini Rex', variety: 'Castor', age: '6 months',
      ageClass: 'Senior', line: 'Ember', status: 'Active', latestWeight: '5 lb 12 oz', legs: '2', grandChampion: '',
    });
    expect(cells(row, 'kg')['latestWeight']).toBe('2.61 kg');
  });

  it('marks outside parents and leaves unknown values empty', () => {
    const stub = { ...row, isStub: true, name: null, birthDate: null, ageClass: null, latestWeightGrams: null, grandChampion: true };
    expect(cells(stub, 'kg')).toMatchObject({ status: 'Outside parent', name: '', age: '', ageClass: '', latestWeight: '', grandChampion: 'GC' });
  });

  it('sorts age opposite to birth date and back again', () => {
    expect(sortFor('age', 'asc')).toEqual({ sort: 'birthDate', dir: 'desc' });
    expect(sortFor('latestWeight', 'desc')).toEqual({ sort: 'latestWeight', dir: 'desc' });
    expect(sortFor('legs', 'asc')).toBeNull();
    expect(headerFor({ sort: 'birthDate', dir: 'desc' })).toEqual({ active: 'age', direction: 'asc' });
    expect(headerFor({ sort: 'name', dir: 'asc' })).toEqual({ active: 'name', direction: 'asc' });
  });
});
