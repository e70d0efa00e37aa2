// Any /api/v1 path without a route of its own: a problem+json 404 with its call-log row, instead of the
// framework's HTML page, so integrators get the same error shape everywhere under the versioned prefix.
import { ApiError } from "@/lib/api/problem";
import { withPublic } from "@/lib/api/with-api-key";

export const dynamic = "force-dynamic";

const noSuchRoute = withPublic(
  async ({ url }) => {
    throw new ApiError("not_found", `There is no API route at ${url.pathname}. The routes are listed in /api/v1/openapi.json.`);
  },
  { route: "/api/v1/*" },
);

export const GET = noSuchRoute;
export const POST = noSuchRoute;
export const PUT = noSuchRoute;
export const PATCH = noSuchRoute;
export const DELETE = noSuchRoute;
