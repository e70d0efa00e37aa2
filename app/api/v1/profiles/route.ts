// GET /api/v1/profiles: the organisation's profiles and the built-in templates.
import { listProfilesForKey } from "@/lib/api/profiles-read";
import { json } from "@/lib/api/respond";
import { ProfileListSchema } from "@/lib/api/schemas/profiles";
import { withApiKey } from "@/lib/api/with-api-key";
import { refuseOtherMethods } from "@/lib/api/other-methods";

export const dynamic = "force-dynamic";

export const GET = withApiKey(async (ctx) => json(ProfileListSchema, await listProfilesForKey(ctx.db, ctx.organisationId)), {
  route: "/api/v1/profiles",
  scope: "profiles:read",
});

export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods("/api/v1/profiles", ["GET"]);
