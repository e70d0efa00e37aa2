"use server";
import { cookies } from "next/headers";
import { revalidatePath } from "next/cache";
import { isMember } from "@/lib/auth/memberships";
import { ORG_COOKIE, requireMember } from "@/lib/auth/session";

/** Switches the organisation a member of several is working in. */
export async function switchOrganisation(organisationId: string): Promise<void> {
  const m = await requireMember();
  if (!(await isMember(m.userId, organisationId))) return;
  (await cookies()).set(ORG_COOKIE, organisationId, { httpOnly: true, sameSite: "lax", path: "/", secure: process.env.NEXTAUTH_URL?.startsWith("https://") ?? false });
  revalidatePath("/console", "layout");
}
