import { safeReturnUrl } from './return-url';

describe('safeReturnUrl', () => {
  it('keeps paths inside the app, with their query', () => {
    expect(safeReturnUrl('/r/7/access')).toBe('/r/7/access');
    expect(safeReturnUrl('/c/3/members?page=2')).toBe('/c/3/members?page=2');
  });

  it.each([undefined, null, '', 'https://elsewhere.example/', '//elsewhere.example', '/\\elsewhere.example', '/sign-in', '/sign-in?returnUrl=%2F', '/error'])(
    'turns %s into the overview',
    (raw) => expect(safeReturnUrl(raw)).toBe('/'),
  );
});
