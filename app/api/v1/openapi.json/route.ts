// GET /api/v1/openapi.json: the OpenAPI 3.1 document, built once per process.
import { withPublic } from "@/lib/api/with-api-key";
import { openApiDocument } from "@/openapi/document";
import { refuseOtherMethods } from "@/lib/api/other-methods";

export const dynamic = "force-dynamic";

export const GET = withPublic(
  async () => Response.json(openApiDocument(), { headers: { "cache-control": "public, max-age=300" } }),
  { route: "/api/v1/openapi.json" },
);

export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods("/api/v1/openapi.json", ["GET"]);
