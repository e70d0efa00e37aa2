// Builds the OpenAPI 3.1 document once per process; the route serves the cached copy.
import { OpenApiGeneratorV31 } from "@asteasolutions/zod-to-openapi";
import { APP_VERSION } from "@/lib/version";
import { createRegistry } from "./registry";
import { gradingsBatch } from "./paths/gradings.batch";
import { gradingsCreate } from "./paths/gradings.create";
import { metaHealth } from "./paths/meta.health";
import { metaOpenapi } from "./paths/meta.openapi";
import { profilesGet } from "./paths/profiles.get";
import { profilesList } from "./paths/profiles.list";
import { profilesVersion } from "./paths/profiles.version";
import { verdictsGet } from "./paths/verdicts.get";
import { verdictsList } from "./paths/verdicts.list";
import { verdictsReplay } from "./paths/verdicts.replay";

export const OPERATIONS = [
  gradingsCreate,
  gradingsBatch,
  verdictsList,
  verdictsGet,
  verdictsReplay,
  profilesList,
  profilesGet,
  profilesVersion,
  metaHealth,
  metaOpenapi,
];

const DESCRIPTION = `Grade installed optical fibre links against your organisation's limit profiles.

Send a link test (length, insertion loss and optical return loss per wavelength, and the event list) and get back a verdict (\`pass\`, \`marginal\` or \`fail\`), the headroom in dB and the reasons, each citing the published source of its limit. Every verdict is stored immutably in your organisation's audit chain and can be replayed.

**Authentication**: \`Authorization: Bearer <key>\`. Keys are created in the console; sandbox keys start with \`gg_sbx_\`.
**Errors**: RFC 9457 problem+json with a stable \`code\` and the request id; 422 answers list a JSON pointer for every bad field.
**Retries**: send an \`Idempotency-Key\` header on POST and retry safely.
**Limits**: per-key requests per minute, announced in \`RateLimit-*\` headers; 429 answers carry \`Retry-After\`.

Grading supports decisions; it does not replace the safety rules of fibre work: never look into a fibre end or connector, use an inspection scope with a filter, dispose of fibre offcuts safely, and follow local codes and licensed practice.`;

export function buildOpenApiDocument() {
  const registry = createRegistry();
  for (const op of OPERATIONS) registry.registerPath(op());
  return new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: "3.1.0",
    info: { title: "Glassgrade API", version: APP_VERSION, description: DESCRIPTION, license: { name: "Proprietary", identifier: "LicenseRef-Glassgrade" } },
    servers: [{ url: "/", description: "This Glassgrade installation" }],
    tags: [
      { name: "Gradings", description: "Grade link tests and store the verdicts" },
      { name: "Verdicts", description: "Read and replay stored verdicts" },
      { name: "Profiles", description: "Limit profiles and templates" },
      { name: "Service", description: "Health and this document" },
    ],
  });
}

let cached: ReturnType<typeof buildOpenApiDocument> | undefined;

export function openApiDocument() {
  cached ??= buildOpenApiDocument();
  return cached;
}
