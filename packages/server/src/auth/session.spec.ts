import { safeReturnPath } from './session';

describe('safeReturnPath', () => {
  it.each([
    ['/plans/crosscut-sled?units=in', '/plans/crosscut-sled?units=in'],
    ['/', '/'],
  ])('keeps the site path %s', (input, expected) => {
    expect(safeReturnPath(input)).toBe(expected);
  });

  it.each([
    'https://elsewhere.example/',
    '//elsewhere.example/',
    '/\\elsewhere.example',
    'plans',
    '',
    undefined,
    ['/a'],
  ])('replaces %p with the front page', (input) => {
    expect(safeReturnPath(input)).toBe('/');
  });
});
