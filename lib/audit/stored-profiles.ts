// The exact profile version a stored verdict was graded under, resolved once per run: a bulk replay
// meets few distinct versions among many verdicts.
import type { Database } from "@/db";
import type { Profile } from "@/lib/grading/schema";
import { resolveProfile } from "@/lib/profiles/resolve";

export class StoredProfileCache {
  private readonly cache = new Map<string, Profile | null>();
  constructor(private readonly db: Database, private readonly organisationId: string) {}

  async get(slug: string, version: number): Promise<Profile | null> {
    const key = `${slug}@${version}`;
    if (!this.cache.has(key)) {
      const r = await resolveProfile(this.db, this.organisationId, key);
      this.cache.set(key, r.ok ? r.profile : null);
    }
    return this.cache.get(key)!;
  }
}
