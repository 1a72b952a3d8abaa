/**
 * The one rule table: which workshop role may do what. The API's guard reads it to allow or
 * refuse a request, and the client reads it to hide what a role cannot do, so the two can never
 * disagree.
 *
 * - owner: runs the workshop (members, invitations, settings, price list, deleting it) and can
 *   do everything a designer can;
 * - designer: creates, saves, forks, archives and publishes designs inside the workshop, and
 *   keeps its stock (the sheets, offcuts and boards on hand) up to date, as the people who cut do;
 * - reviewer: a client or colleague who looks, comments and approves a revision, never edits.
 */

/** The roles a member of a workshop can hold. */
export const ROLES = ['owner', 'designer', 'reviewer'] as const;
export type Role = (typeof ROLES)[number];

/** Everything a member can be allowed to do inside a workshop. */
export const ACTIONS = [
  'workshop.read',
  'workshop.update',
  'workshop.delete',
  'members.read',
  'members.manage',
  'invitations.manage',
  'priceList.manage',
  'stock.manage',
  'design.read',
  'design.create',
  'design.edit',
  'design.fork',
  'design.archive',
  'design.publish',
  'comment.read',
  'comment.create',
  'approval.decide',
] as const;
export type Action = (typeof ACTIONS)[number];

const DESIGNER: readonly Action[] = [
  'workshop.read', 'members.read', 'design.read', 'design.create', 'design.edit', 'design.fork',
  'design.archive', 'design.publish', 'comment.read', 'comment.create', 'stock.manage',
];

/** Role → the actions it allows. Anything not listed is refused. */
export const RULES: Readonly<Record<Role, readonly Action[]>> = {
  owner: [...DESIGNER, 'workshop.update', 'workshop.delete', 'members.manage', 'invitations.manage', 'priceList.manage'],
  designer: DESIGNER,
  // Approval is the client's word on a revision, so only reviewers give it.
  reviewer: ['workshop.read', 'members.read', 'design.read', 'comment.read', 'comment.create', 'approval.decide'],
};

/** True when a member holding `role` may perform `action`; `null` (not a member) may do nothing. */
export function can(role: Role | null | undefined, action: Action): boolean {
  return role ? RULES[role].includes(action) : false;
}

/** The actions `role` allows, for a client that hides controls. */
export function actionsFor(role: Role | null | undefined): readonly Action[] {
  return role ? RULES[role] : [];
}

/** True when `value` names a role. */
export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
