// GET /api/v1/profiles/{slug}/versions/{version}: the frozen limits of one version.
import { ApiError } from "@/lib/api/problem";
import { getProfileVersionForKey } from "@/lib/api/profiles-read";
import { json } from "@/lib/api/respond";
import { ProfileVersionSchema } from "@/lib/api/schemas/profiles";
import { withApiKey } from "@/lib/api/with-api-key";
import { refuseOtherMethods } from "@/lib/api/other-methods";

export const dynamic = "force-dynamic";

export const GET = withApiKey<{ slug: string; version: string }>(
  async (ctx, { slug, version }) => {
    const n = /^[1-9][0-9]{0,8}$/.test(version) ? Number(version) : null;
    const v = n === null ? null : await getProfileVersionForKey(ctx.db, ctx.organisationId, slug, n);
    if (!v) throw new ApiError("not_found", `Profile ${slug} has no version ${version}.`);
    return json(ProfileVersionSchema, v);
  },
  { route: "/api/v1/profiles/{slug}/versions/{version}", scope: "profiles:read" },
);

export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods("/api/v1/profiles/{slug}/versions/{version}", ["GET"]);
