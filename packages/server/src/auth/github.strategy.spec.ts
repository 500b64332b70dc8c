import { verifiedEmailOf } from './github.strategy';

describe('verifiedEmailOf', () => {
  it('prefers the verified primary address', () => {
    expect(
      verifiedEmailOf([
        { value: 'old@example.com', verified: true },
        { value: 'main@example.com', primary: true, verified: true },
      ]),
    ).toBe('main@example.com');
  });

  it('never takes an unverified address, even the primary one', () => {
    expect(verifiedEmailOf([{ value: 'main@example.com', primary: true, verified: false }])).toBeUndefined();
    expect(verifiedEmailOf(undefined)).toBeUndefined();
  });
});
