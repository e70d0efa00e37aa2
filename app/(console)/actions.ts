"use server";
import { cookies } from "next/headers";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { isMember } from "@/lib/auth/memberships";
import { loadMember, ORG_COOKIE } from "@/lib/auth/session";

/** Switches the organisation a member of several is working in. */
export async function switchOrganisation(organisationId: string): Promise<void> {
  if (!z.uuid().safeParse(organisationId).success) return;
  const m = await loadMember();
  if (!m || !(await isMember(m.userId, organisationId))) return;
  (await cookies()).set(ORG_COOKIE, organisationId, { httpOnly: true, sameSite: "lax", path: "/", secure: process.env.NEXTAUTH_URL?.startsWith("https://") ?? false });
  revalidatePath("/console", "layout");
}
