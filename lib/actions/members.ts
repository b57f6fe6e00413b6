'use server';

import { revalidatePath } from 'next/cache';
import { failure, validatedAction, type ActionResult } from '@/lib/server/validated-action';
import { changeRoleSchema, inviteMemberSchema, removeMemberSchema, revokeInvitationSchema } from '@/lib/schemas/admin';
import { createInvitation, revokeInvitation } from '@/lib/data/invitations';
import { changeMemberRole, MemberChangeRefused, removeMember } from '@/lib/data/members';

// Every action here is admin-only; the data layer checks that (and the organisation) on each call.

export const inviteMember = validatedAction(inviteMemberSchema, async (input): Promise<ActionResult> => {
  const outcome = await createInvitation(input);
  if (!outcome.ok) return failure(outcome.message, outcome.field ? { [outcome.field]: [outcome.message] } : {});
  revalidatePath('/admin/members');
  return { ok: true, message: `Invitation sent to ${input.email}.` };
});

export const changeRole = validatedAction(changeRoleSchema, async (input): Promise<ActionResult> => {
  try {
    await changeMemberRole(input);
  } catch (e) {
    if (e instanceof MemberChangeRefused) return failure(e.message, { role: [e.message] });
    throw e;
  }
  revalidatePath('/admin/members');
  return { ok: true, message: 'Role changed.' };
});

export const removeMemberAction = validatedAction(removeMemberSchema, async (input): Promise<ActionResult> => {
  try {
    await removeMember(input);
  } catch (e) {
    if (e instanceof MemberChangeRefused) return failure(e.message);
    throw e;
  }
  revalidatePath('/admin/members');
  return { ok: true, message: 'Member removed.' };
});

export const revokeInvitationAction = validatedAction(revokeInvitationSchema, async (input): Promise<ActionResult> => {
  await revokeInvitation(input);
  revalidatePath('/admin/members');
  return { ok: true, message: 'Invitation withdrawn.' };
});
