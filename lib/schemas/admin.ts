/**
 * Zod schemas for the members and invitations forms, shared by the client (react-hook-form) and the
 * server actions. No server imports: bundled into the browser.
 */
import { z } from 'zod';
import { emailSchema } from './auth';

import { roles } from './roles';

export const roleValues = roles;
export const roleSchema = z.enum(roleValues, { error: `Choose a role: ${roles.slice(0, -1).join(', ')} or ${roles[roles.length - 1]}.` });

const idSchema = (what: string) => z.string({ error: `The ${what} is missing.` }).uuid({ error: `The ${what} is not valid.` });

export const inviteMemberSchema = z.object({ email: emailSchema, role: roleSchema });
export type InviteMemberInput = z.input<typeof inviteMemberSchema>;

export const changeRoleSchema = z.object({ membershipId: idSchema('membership'), role: roleSchema });
export type ChangeRoleInput = z.input<typeof changeRoleSchema>;

export const removeMemberSchema = z.object({ membershipId: idSchema('membership') });
export const revokeInvitationSchema = z.object({ invitationId: idSchema('invitation') });
export const switchOrganisationSchema = z.object({ organisationId: idSchema('organisation') });
