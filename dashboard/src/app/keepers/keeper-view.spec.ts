import { KEEPER_DEFAULTS, keeperParams, keeperViewFrom, weightsParam } from './keeper-view';

describe('keeper board view in the address', () => {
  it('reads the API’s own weights form, unnamed components weighing 1', () => {
    const view = keeperViewFrom({ weights: 'weightOnTarget:3,inbreeding:0', trait: 'body_type' });
    expect(view.trait).toBe('body_type');
    expect(view.weights).toEqual({ breedingValue: 1, ownEvaluation: 1, weightOnTarget: 3, parentsPlacementIndex: 1, inbreeding: 0 });
  });

  it('falls back per key for what the API would refuse, and holds weights within the sliders', () => {
    expect(keeperViewFrom({ weights: 'colour:2', trait: 'Not A Trait!' })).toEqual(KEEPER_DEFAULTS);
    expect(keeperViewFrom({ weights: 'breedingValue:40,inbreeding:-2' }).weights).toMatchObject({ breedingValue: 5, inbreeding: 0 });
  });

  it('writes only what differs from the defaults, so the plain board has a plain address', () => {
    expect(keeperParams(KEEPER_DEFAULTS)).toEqual({});
    const view = { trait: 'weight_16w', weights: { ...KEEPER_DEFAULTS.weights, ownEvaluation: 2.5, inbreeding: 0 } };
    expect(keeperParams(view)).toEqual({ trait: 'weight_16w', weights: 'ownEvaluation:2.5,inbreeding:0' });
    expect(keeperViewFrom(keeperParams(view))).toEqual(view);
    expect(weightsParam(KEEPER_DEFAULTS.weights)).toBe('');
  });
});
