// Handlers for the methods a route does not serve. Without them Next.js answers a bare 405 with no body
// and no call-log row; with them every answer under /api/v1 is problem+json with a request id, and the
// 405 names the methods that do work in its Allow header (RFC 9110, 15.5.6).
import { ApiError } from "./problem";
import { withPublic } from "./with-api-key";

const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
type Method = (typeof METHODS)[number];

/**
 * `export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods("/api/v1/health", ["GET"]);` Exporting a
 * method the route also serves is a duplicate export, so the compiler catches a wrong list.
 */
export function refuseOtherMethods(route: string, served: Method[]): Record<Method, (req: Request) => Promise<Response>> {
  // Next.js answers HEAD from GET and OPTIONS by itself.
  const allow = [...served, ...(served.includes("GET") ? ["HEAD"] : []), "OPTIONS"].join(", ");
  const refuse = withPublic(
    async ({ req }) => {
      throw new ApiError("method_not_allowed", `${req.method} is not served at ${route}; it answers ${served.join(" and ")}.`, {
        headers: { Allow: allow },
      });
    },
    { route },
  );
  return Object.fromEntries(METHODS.map((m) => [m, refuse])) as Record<Method, typeof refuse>;
}
