"use server";
import { runAction } from "@/lib/auth/action-result";
import { requireMember } from "@/lib/auth/session";
import { setRetention } from "@/lib/retention/call-log";

export async function saveRetention(input: unknown) {
  const m = await requireMember();
  return runAction(() => setRetention({ actor: m }, input));
}
