import { DomainError } from './domain-error';
import { assertOwnedBy } from './ownership';

const plan = { id: 3, ownerId: 11, title: 'Crosscut sled' };
const ownerIdOf = (p: typeof plan) => p.ownerId;

describe('assertOwnedBy', () => {
  it('hands back what the owner asked for', () => {
    expect(assertOwnedBy({ memberId: 11, role: 'member' }, plan, ownerIdOf)).toBe(plan);
  });

  it('refuses another member with not_owner and the given message', () => {
    let thrown: unknown;
    try {
      assertOwnedBy({ memberId: 12, role: 'moderator' }, plan, ownerIdOf, { message: 'Not your plan.' });
    } catch (error) {
      thrown = error;
    }
    expect(thrown).toBeInstanceOf(DomainError);
    expect(thrown).toMatchObject({ kind: 'forbidden', code: 'not_owner', message: 'Not your plan.' });
  });

  it('lets the roles named in alsoRoles act on anyone’s', () => {
    expect(assertOwnedBy({ memberId: 12, role: 'moderator' }, plan, ownerIdOf, { alsoRoles: ['moderator'] })).toBe(
      plan,
    );
    expect(() =>
      assertOwnedBy({ memberId: 12, role: 'member' }, plan, ownerIdOf, { alsoRoles: ['moderator'] }),
    ).toThrow(DomainError);
  });
});
