/**
 * The roles of a membership (see the product brief): the one list, used by the database enum
 * (db/schema/memberships.ts), the forms (lib/schemas/admin.ts) and the authorization checks of the
 * data layer and its core operations. No imports, so client bundles can use it.
 */
export const roles = ['admin', 'planner', 'translator', 'council'] as const;
export type Role = (typeof roles)[number];

/** Role sets used across the app, so a page, its action and the data layer cannot drift apart. */
export const ROLES = {
  all: roles,
  admin: ['admin'],
  planning: ['admin', 'planner'],
  translating: ['admin', 'planner', 'translator'],
} as const satisfies Record<string, readonly Role[]>;

/** Whether a member's role is one of `allowed`. */
export function hasRole(actor: { role: Role }, allowed: readonly Role[]): boolean {
  return allowed.includes(actor.role);
}
