/**
 * The roles of a membership (see the product brief): the one list, used by the database enum
 * (db/schema/memberships.ts), the forms (lib/admin-schemas.ts) and the authorization core. No imports,
 * so client bundles can use it.
 */
export const roles = ['admin', 'planner', 'translator', 'council'] as const;
export type Role = (typeof roles)[number];
