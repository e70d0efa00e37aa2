import { getServerSession } from "next-auth";
import { cache } from "react";
import { cookies, headers } from "next/headers";
import { forbidden, redirect } from "next/navigation";
import { authOptions, SIGN_IN_PATH } from "./options";
import type { Member } from "./context";
import { resolveMember } from "./memberships";
import { can, type Permission } from "./roles";

// Which organisation a member of several is working in; a plain preference, checked against the
// memberships on every request.
export const ORG_COOKIE = "gg_org";

/** The signed-in member in their current organisation, or null when nobody (or an ex-member) is signed in. */
export async function loadMember(): Promise<Member | null> {
  const session = await getServerSession(authOptions);
  const userId = session?.user?.id;
  if (!userId) return null;
  const preferred = (await cookies()).get(ORG_COOKIE)?.value ?? session.user?.organisationId;
  return resolveMember(userId, preferred);
}

/**
 * loadMember, cached per request so the layout and the page share one session decode and one membership
 * query. Code that changes the organisation cookie must use loadMember so it never sees a stale answer.
 */
export const getMember = cache(loadMember);

/**
 * For server components and server actions: the member, or a redirect to sign-in when there is none,
 * or the 403 page (app/(console)/console/forbidden.tsx) when the role lacks `permission`.
 */
export async function requireMember(permission?: Permission): Promise<Member> {
  const member = await getMember();
  if (!member) {
    const here = (await headers()).get("x-glassgrade-path") ?? "/console";
    redirect(`${SIGN_IN_PATH}?callbackUrl=${encodeURIComponent(here)}`);
  }
  if (permission && !can(member.role, permission)) forbidden();
  return member;
}
