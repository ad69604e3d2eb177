import { safeReturnUrl } from './return-url';

describe('safeReturnUrl', () => {
  it('keeps a path inside the app', () => {
    expect(safeReturnUrl('/members?tab=1')).toBe('/members?tab=1');
  });

  it.each([null, '', 'https://elsewhere.example', '//elsewhere.example', '/\\elsewhere', '/sign-in'])(
    'falls back to /today for %p',
    (candidate) => {
      expect(safeReturnUrl(candidate)).toBe('/today');
    },
  );
});
