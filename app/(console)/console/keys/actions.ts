"use server";
import { runAction } from "@/lib/auth/action-result";
import { requireMember } from "@/lib/auth/session";
import { createKey, revokeKey } from "@/lib/keys/manage";

// Thin wrappers: who is asking comes from the session; what is allowed is decided in lib/keys/manage.ts.
export async function createKeyAction(input: unknown) {
  const m = await requireMember();
  return runAction(() => createKey({ actor: m }, input));
}

export async function revokeKeyAction(input: unknown) {
  const m = await requireMember();
  return runAction(() => revokeKey({ actor: m }, input));
}
