import type { EditedAnimal } from './animal-request';
import { animalChange, animalFormValue, newAnimalRequest } from './animal-request';

const stored: EditedAnimal = {
  id: 5, rabbitryId: 1, earId: 'BF101', name: 'Sorrel', sex: 'doe', variety: 'Castor', birthDate: '2026-05-15', status: 'active',
  isStub: false, breedId: 2, breed: 'Mini Rex', sireId: 3, damId: 4, litterId: null, line: 'Ember', registrationNo: null,
  grandChampion: false, breeder: null, stubWeightGrams: null, hasPhoto: false, notes: null, keeperDecision: null,
  sireEarId: 'BF040', damEarId: 'BF041',
};

describe('animal requests', () => {
  it('sends a new animal with empty fields as not given', () => {
    const value = { ...animalFormValue(null), earId: ' BF200 ', sex: 'buck' as const, breedId: 2, sireEarId: 'WH14', createStubs: true };
    expect(newAnimalRequest(value)).toEqual({
      earId: 'BF200', sex: 'buck', name: null, breedId: 2, variety: null, birthDate: null, sireEarId: 'WH14', damEarId: null,
      createStubs: true, line: null, registrationNo: null, notes: null,
    });
  });

  it('refuses to build a request without a sex', () => {
    expect(() => newAnimalRequest(animalFormValue(null))).toThrow('newAnimalRequest requires a sex');
  });

  it('sends only the changed fields of an edit, a cleared one as null', () => {
    const value = { ...animalFormValue(stored), name: 'Sorrel ', line: '', variety: 'Lynx' };
    expect(animalChange(value, stored)).toEqual({ line: null, variety: 'Lynx' });
  });

  it('sends the stub choice along with changed parents', () => {
    const value = { ...animalFormValue(stored), damEarId: 'XO9', createStubs: true };
    expect(animalChange(value, stored)).toEqual({ damEarId: 'XO9', createStubs: true });
  });
});
