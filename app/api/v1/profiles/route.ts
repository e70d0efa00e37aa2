// GET /api/v1/profiles: the organisation's profiles and the built-in templates.
import { listProfilesForKey } from "@/lib/api/profiles-read";
import { json } from "@/lib/api/respond";
import { ProfileListSchema } from "@/lib/api/schemas/profiles";
import { withApiKey } from "@/lib/api/with-api-key";

export const dynamic = "force-dynamic";

export const GET = withApiKey(async (ctx) => json(ProfileListSchema, await listProfilesForKey(ctx.db, ctx.organisationId)), {
  route: "/api/v1/profiles",
  scope: "profiles:read",
});
