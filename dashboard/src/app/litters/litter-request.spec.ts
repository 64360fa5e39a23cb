import type { Litter } from '@shared/contracts/litters';
import { litterChange, litterFormValue, newLitterRequest } from './litter-request';

const litter: Litter = {
  id: 3, code: 'BF-2202', sireId: 1, sireEarId: 'BF002', damId: 2, damEarId: 'BF004', bredOn: '2022-02-16', kindledOn: '2022-03-22',
  kindlingWindow: null, bornAlive: 5, bornDead: 0, weaned: 5, weight21dGrams: 1134, kitsRecorded: 5, notes: null,
};

describe('litter requests', () => {
  it('leaves the code to the API when none is given', () => {
    const value = { ...litterFormValue(null, 'lb-oz'), damEarId: 'BF004', bredOn: '2026-11-10' };
    expect(newLitterRequest(value)).toEqual({
      sireEarId: null, damEarId: 'BF004', bredOn: '2026-11-10', kindledOn: null, bornAlive: null, bornDead: null, weaned: null,
      weight21d: null, notes: null,
    });
  });

  it('shows the recorded weight in the user’s unit and does not resend it unchanged', () => {
    const value = litterFormValue(litter, 'lb-oz');
    expect(value.weight21d).toBe('2 lb 8 oz');
    expect(litterChange({ ...value, weaned: 4 }, litter, 'lb-oz')).toEqual({ weaned: 4 });
    expect(litterChange({ ...value, weight21d: '2-9' }, litter, 'lb-oz')).toEqual({ weight21d: '2-9' });
    expect(litterChange({ ...value, kindledOn: '' }, litter, 'lb-oz')).toEqual({ kindledOn: null });
  });
});
