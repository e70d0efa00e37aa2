// Which profile a grading call uses: the one it names (a bad name is the caller's 422) or else the
// organisation's default (a bad default is a 409: the organisation's settings, not the call, are wrong).
import type { Database } from "@/db";
import type { Profile } from "@/lib/grading/schema";
import { resolveProfile } from "@/lib/profiles/resolve";
import { ApiError } from "./problem";

export async function profileForRequest(
  db: Database,
  organisationId: string,
  named: string | undefined,
  defaultRef: string,
): Promise<Profile> {
  const r = await resolveProfile(db, organisationId, named ?? defaultRef);
  if (r.ok) return r.profile;
  if (named !== undefined) {
    throw new ApiError("validation_failed", "The profile named in the request cannot be used.", {
      errors: [{ pointer: "/profile", message: r.reason }],
    });
  }
  throw new ApiError("conflict", `Your organisation's default profile "${defaultRef}" cannot be used (${r.reason}); name a profile in the request or fix the default in the console.`);
}
