import { describe, expect, it } from 'vitest';
import { GROUP_ROLES_FOR, holdsGroupRole, mayInGroup } from '../../shared/permissions';

const as = (role: 'organiser' | 'host' | 'fixer', groupId = 1) => ({ admin: false, roles: [{ groupId, role }] });

describe('shared/permissions: who may do what in a group', () => {
  it('lets reception read an item but not do the bench’s work or use the salvage stock', () => {
    expect(mayInGroup(as('host'), 1, 'readItem')).toBe(true);
    expect(mayInGroup(as('host'), 1, 'benchWork')).toBe(false);
    expect(mayInGroup(as('host'), 1, 'useSalvage')).toBe(false);
  });
  it('lets fixers and organisers do the bench’s work and use the salvage stock, in their own group only', () => {
    for (const role of ['fixer', 'organiser'] as const) {
      expect(mayInGroup(as(role), 1, 'benchWork')).toBe(true);
      expect(mayInGroup(as(role), 1, 'useSalvage')).toBe(true);
      expect(mayInGroup(as(role, 2), 1, 'useSalvage')).toBe(false);
    }
  });
  it('lets an admin do everything and nobody signed out do anything', () => {
    for (const action of Object.keys(GROUP_ROLES_FOR) as (keyof typeof GROUP_ROLES_FOR)[]) {
      expect(mayInGroup({ admin: true, roles: [] }, 7, action)).toBe(true);
      expect(mayInGroup(null, 7, action)).toBe(false);
    }
    expect(holdsGroupRole(undefined, 1, ['host'])).toBe(false);
  });
});
