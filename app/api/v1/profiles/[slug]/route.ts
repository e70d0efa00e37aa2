// GET /api/v1/profiles/{slug}: one profile and its published versions.
import { ApiError } from "@/lib/api/problem";
import { getProfileForKey } from "@/lib/api/profiles-read";
import { json } from "@/lib/api/respond";
import { ProfileDetailSchema } from "@/lib/api/schemas/profiles";
import { withApiKey } from "@/lib/api/with-api-key";
import { refuseOtherMethods } from "@/lib/api/other-methods";

export const dynamic = "force-dynamic";

export const GET = withApiKey<{ slug: string }>(
  async (ctx, { slug }) => {
    const p = await getProfileForKey(ctx.db, ctx.organisationId, slug);
    if (!p) throw new ApiError("not_found", `No profile or template called ${slug}.`);
    return json(ProfileDetailSchema, p);
  },
  { route: "/api/v1/profiles/{slug}", scope: "profiles:read" },
);

export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods("/api/v1/profiles/{slug}", ["GET"]);
