"use server";
// Server actions of the profile pages. Each one resolves the signed-in member on the server and hands it
// to lib/profiles as the actor; the lib function checks the role, so a hidden button is never the guard.
import { revalidatePath } from "next/cache";
import { getDb } from "@/db";
import { runAction, type ActionResult } from "@/lib/auth/action-result";
import { requireMember } from "@/lib/auth/session";
import { InvalidInputError, type FieldIssue } from "@/lib/profiles/access";
import { setDefaultProfile } from "@/lib/profiles/default-profile";
import { cloneTemplate, discardDraft, openDraft, saveDraft } from "@/lib/profiles/drafts";
import type { Limits } from "@/lib/profiles/limits";
import { publishDraft } from "@/lib/profiles/publish";

export type FormResult<T> = { ok: true; data: T } | { ok: false; error: string; issues: FieldIssue[] };

async function ctx() {
  return { db: getDb(), actor: await requireMember() };
}

/** Like runAction, but hands back every field issue so the form can mark each field. */
async function runForm<T>(fn: () => Promise<T>): Promise<FormResult<T>> {
  let issues: FieldIssue[] = [];
  const r: ActionResult<T> = await runAction(async () => {
    try {
      return await fn();
    } catch (err) {
      if (err instanceof InvalidInputError) issues = err.issues;
      throw err;
    }
  });
  if (r.ok) return r;
  return { ok: false, error: issues.length ? "Some values need attention; see the marked fields." : r.error, issues: issues.length ? issues : r.field ? [{ path: r.field, message: r.error }] : [] };
}

export async function cloneTemplateAction(input: { templateSlug: string; slug: string; name: string }): Promise<FormResult<{ slug: string }>> {
  return runForm(async () => {
    const out = await cloneTemplate(await ctx(), input);
    revalidatePath("/console/profiles");
    return out;
  });
}

export async function saveDraftAction(slug: string, limits: unknown): Promise<FormResult<{ limits: Limits }>> {
  return runForm(async () => {
    const saved = await saveDraft(await ctx(), slug, limits);
    revalidatePath(`/console/profiles/${slug}`);
    return { limits: saved };
  });
}

export async function openDraftAction(slug: string): Promise<FormResult<null>> {
  return runForm(async () => {
    await openDraft(await ctx(), slug);
    revalidatePath(`/console/profiles/${slug}`);
    return null;
  });
}

export async function discardDraftAction(slug: string): Promise<FormResult<null>> {
  return runForm(async () => {
    await discardDraft(await ctx(), slug);
    revalidatePath(`/console/profiles/${slug}`);
    return null;
  });
}

export async function publishDraftAction(slug: string, note: string): Promise<FormResult<{ version: number }>> {
  return runForm(async () => {
    const { version } = await publishDraft(await ctx(), slug, { note });
    revalidatePath("/console/profiles");
    revalidatePath(`/console/profiles/${slug}`);
    return { version };
  });
}

export async function setDefaultProfileAction(ref: string): Promise<FormResult<{ ref: string }>> {
  return runForm(async () => {
    const out = await setDefaultProfile(await ctx(), ref);
    revalidatePath("/console/profiles", "layout");
    return out;
  });
}
