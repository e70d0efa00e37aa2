"use server";
import { runAction } from "@/lib/auth/action-result";
import { requireMember } from "@/lib/auth/session";
import { inviteMember, revokeInvitation } from "@/lib/members/invitations";
import { changeMemberRole, removeMember } from "@/lib/members/members";

// Thin wrappers: lib/members checks the role and the organisation on every call.
export async function inviteMemberAction(input: unknown) {
  const m = await requireMember();
  return runAction(() => inviteMember({ actor: m }, input));
}

export async function revokeInvitationAction(input: unknown) {
  const m = await requireMember();
  return runAction(() => revokeInvitation({ actor: m }, input));
}

export async function changeRoleAction(input: unknown) {
  const m = await requireMember();
  return runAction(() => changeMemberRole({ actor: m }, input));
}

export async function removeMemberAction(input: unknown) {
  const m = await requireMember();
  return runAction(() => removeMember({ actor: m }, input));
}
