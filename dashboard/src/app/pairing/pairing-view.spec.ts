import { pairingParams, pairingViewFrom } from './pairing-view';

describe('pairing view', () => {
  it('reads the animal, trait and number of mates from the address', () => {
    expect(pairingViewFrom({ animal: '108', trait: 'body_type', limit: '50' })).toEqual({ animal: 108, trait: 'body_type', limit: 50 });
  });

  it('falls back to the API defaults for missing or refused values', () => {
    expect(pairingViewFrom({ animal: 'BF100', limit: '500' })).toEqual({ animal: null, trait: 'weight_12w', limit: 20 });
    expect(pairingParams(pairingViewFrom({ animal: '7' }))).toEqual({ animal: '7' });
  });
});
