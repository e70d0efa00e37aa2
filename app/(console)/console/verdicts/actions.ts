"use server";
import { getDb } from "@/db";
import { runAction, type ActionResult } from "@/lib/auth/action-result";
import { requireMember } from "@/lib/auth/session";
import { replayOne, type ReplayOutcome } from "@/lib/audit/replay";

/** Re-grades one stored verdict under its stored profile version; writes nothing. */
export async function replayVerdictAction(id: string): Promise<ActionResult<ReplayOutcome>> {
  return runAction(async () => replayOne({ db: getDb(), actor: await requireMember() }, id));
}
