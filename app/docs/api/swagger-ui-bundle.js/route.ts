// GET /docs/api/swagger-ui-bundle.js: swagger-ui's self-contained browser bundle, served from the
// installed package. Bundling swagger-ui-react through Turbopack breaks its OpenAPI 3.1 resolver in the
// browser ("refract is not a function", swagger-api/swagger-ui#10599), so the page loads this prebuilt
// bundle instead. Read once per process; no network is involved.
import { readFile } from "node:fs/promises";
import path from "node:path";

export const dynamic = "force-static";

let bundle: Promise<Buffer> | undefined;

export async function GET() {
  bundle ??= readFile(path.join(process.cwd(), "node_modules", "swagger-ui-react", "swagger-ui-bundle.js"));
  return new Response(new Uint8Array(await bundle), {
    headers: { "content-type": "text/javascript; charset=utf-8", "cache-control": "public, max-age=86400" },
  });
}
