// Grade one or many tests under one profile and store them in the chain. Used by the API and the seed.
import type { StoredVerdict } from "@/db/schema";
import { grade } from "@/lib/grading";
import type { LinkTest, Profile } from "@/lib/grading/schema";
import { storeGradings, type StoreContext } from "./store";

export async function gradeAndStore(
  ctx: StoreContext,
  profile: Profile,
  items: { test: LinkTest; createdAt?: Date }[],
): Promise<StoredVerdict[]> {
  const graded = items.map((it) => ({ test: it.test, result: grade(it.test, profile), createdAt: it.createdAt }));
  return storeGradings(ctx, graded);
}
