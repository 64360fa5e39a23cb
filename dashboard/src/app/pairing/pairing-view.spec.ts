import { pairingParams, pairingViewFrom, traitChoices } from './pairing-view';

describe('pairing view', () => {
  it('reads the animal, trait and number of mates from the address', () => {
    expect(pairingViewFrom({ animal: '108', trait: 'body_type', limit: '50' })).toEqual({ animal: 108, trait: 'body_type', limit: 50 });
  });

  it('falls back to the API defaults for missing or refused values', () => {
    expect(pairingViewFrom({ animal: 'BF100', limit: '500' })).toEqual({ animal: null, trait: 'weight_12w', limit: 20 });
    expect(pairingParams(pairingViewFrom({ animal: '7' }))).toEqual({ animal: '7' });
  });
});

describe('traitChoices', () => {
  const breeds = [
    { id: 1, evaluationTemplate: { traits: [{ key: 'body_type', label: 'Body type', points: 30 }, { key: 'fur', label: 'Fur', points: 20 }] } },
    { id: 2, evaluationTemplate: { traits: [{ key: 'body_type', label: 'Body type', points: 25 }, { key: 'head', label: 'Head', points: 10 }] } },
  ];

  it('offers the weights at 8, 12 and 16 weeks, placement score and the breed’s evaluation traits', () => {
    expect(traitChoices(breeds, 1).map((t) => t.label)).toEqual([
      'Weight at 8 weeks', 'Weight at 12 weeks', 'Weight at 16 weeks', 'Placement score at shows', 'Body type (evaluation)', 'Fur (evaluation)',
    ]);
  });

  it('offers each trait once over every breed when the breed is unknown', () => {
    expect(traitChoices(breeds, null).map((t) => t.key)).toEqual(['weight_8w', 'weight_12w', 'weight_16w', 'placement_score', 'body_type', 'fur', 'head']);
  });
});
