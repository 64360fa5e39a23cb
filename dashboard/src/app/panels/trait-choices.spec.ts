import { traitChoices } from './trait-choices';

describe('traitChoices', () => {
  const breeds = [
    { id: 1, evaluationTemplate: { traits: [{ key: 'body_type', label: 'Body type', points: 30 }, { key: 'fur', label: 'Fur', points: 20 }] } },
    { id: 2, evaluationTemplate: { traits: [{ key: 'body_type', label: 'Type of body', points: 25 }, { key: 'head', label: 'Head', points: 10 }] } },
  ];

  it('offers the weights at 8, 12 and 16 weeks, placement score and the breed’s evaluation traits', () => {
    expect(traitChoices(breeds, 1).map((t) => t.label)).toEqual([
      'Weight at 8 weeks', 'Weight at 12 weeks', 'Weight at 16 weeks', 'Placement score at shows', 'Body type (evaluation)', 'Fur (evaluation)',
    ]);
  });

  it('offers each trait once over every breed when the breed is unknown, with the first label seen', () => {
    const all = traitChoices(breeds);
    expect(all.map((t) => t.key)).toEqual(['weight_8w', 'weight_12w', 'weight_16w', 'placement_score', 'body_type', 'fur', 'head']);
    expect(all.find((t) => t.key === 'body_type')?.label).toBe('Body type (evaluation)');
  });
});
