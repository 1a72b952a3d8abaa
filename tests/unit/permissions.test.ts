import { describe, expect, it } from 'vitest';
import { ACTIONS, ROLES, RULES, actionsFor, can, isRole } from '../../shared/permissions.ts';

// The roles' duties come from the product brief (owner, designer, reviewer); these tests pin the
// table to them so a change to who may do what is a deliberate edit here too.
describe('can', () => {
  it('lets an owner do everything a designer can, and run the workshop', () => {
    for (const action of RULES.designer) expect(can('owner', action)).toBe(true);
    for (const action of ['workshop.update', 'workshop.delete', 'members.manage', 'invitations.manage', 'priceList.manage'] as const) {
      expect(can('owner', action)).toBe(true);
      expect(can('designer', action)).toBe(false);
    }
  });

  it('keeps reviewers to reading, commenting and approving', () => {
    expect(can('reviewer', 'design.read')).toBe(true);
    expect(can('reviewer', 'comment.create')).toBe(true);
    expect(can('reviewer', 'approval.decide')).toBe(true);
    for (const action of ['design.create', 'design.edit', 'design.fork', 'design.archive', 'design.publish'] as const) {
      expect(can('reviewer', action)).toBe(false);
    }
  });

  it('lets owners and designers keep the workshop stock, and reviewers only read it', () => {
    expect(ROLES.filter((role) => can(role, 'stock.manage'))).toEqual(['owner', 'designer']);
    expect(can('reviewer', 'workshop.read')).toBe(true);
  });

  it('gives approval to reviewers only', () => {
    expect(ROLES.filter((role) => can(role, 'approval.decide'))).toEqual(['reviewer']);
  });

  it('allows nothing to someone who is not a member', () => {
    for (const action of ACTIONS) {
      expect(can(null, action)).toBe(false);
      expect(can(undefined, action)).toBe(false);
    }
    expect(actionsFor(null)).toEqual([]);
  });

  it('names only known actions, and every action is allowed to some role', () => {
    for (const role of ROLES) for (const action of RULES[role]) expect(ACTIONS).toContain(action);
    for (const action of ACTIONS) expect(ROLES.some((role) => can(role, action))).toBe(true);
  });
});

describe('isRole', () => {
  it('accepts the three roles and nothing else', () => {
    expect(ROLES.every(isRole)).toBe(true);
    expect(isRole('admin')).toBe(false);
    expect(isRole(undefined)).toBe(false);
  });
});
