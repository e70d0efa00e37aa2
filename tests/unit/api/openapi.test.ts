import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { createConfig, lintFromString } from "@redocly/openapi-core";
import { describe, expect, it } from "vitest";
import { buildOpenApiDocument } from "@/openapi/document";

const ROOT = path.resolve(import.meta.dirname, "../../..");
const API_DIR = path.join(ROOT, "app/api/v1");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

function routeFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = path.join(dir, name);
    if (statSync(p).isDirectory()) return routeFiles(p);
    return name === "route.ts" ? [p] : [];
  });
}

/** app/api/v1/verdicts/[id]/route.ts -> /api/v1/verdicts/{id} */
function openApiPath(file: string): string {
  const rel = path.relative(path.join(ROOT, "app"), path.dirname(file)).split(path.sep);
  return "/" + rel.map((s) => s.replace(/^\[(.+)\]$/, "{$1}")).join("/");
}

describe("OpenAPI document", () => {
  const doc = buildOpenApiDocument();

  it("is OpenAPI 3.1 and passes the Redocly linter's recommended rules with no errors", async () => {
    expect(doc.openapi).toBe("3.1.0");
    const config = await createConfig({ extends: ["recommended"] });
    const problems = await lintFromString({ source: JSON.stringify(doc), absoluteRef: "openapi.json", config });
    const errors = problems.filter((p) => p.severity === "error");
    expect(errors.map((e) => `${e.ruleId}: ${e.message} @ ${e.location[0]?.pointer}`)).toEqual([]);
  });

  it("the linter does catch a broken document (so the check above can fail)", async () => {
    const broken = structuredClone(doc) as Record<string, any>;
    delete broken.info;
    broken.paths["/api/v1/gradings"].post.responses = {};
    const config = await createConfig({ extends: ["recommended"] });
    const problems = await lintFromString({ source: JSON.stringify(broken), absoluteRef: "openapi.json", config });
    expect(problems.filter((p) => p.severity === "error").length).toBeGreaterThan(0);
  });

  it("has an operation for every handler exported under app/api/v1", () => {
    const files = routeFiles(API_DIR);
    expect(files.length).toBeGreaterThanOrEqual(9);
    const missing: string[] = [];
    for (const f of files) {
      // The catch-all only answers 404 for paths that are not routes; it is not an operation to document.
      if (f.includes("[...")) continue;
      const src = readFileSync(f, "utf8");
      for (const m of METHODS) {
        if (!new RegExp(`export (const|async function|function) ${m}\\b`).test(src)) continue;
        const p = openApiPath(f);
        const op = (doc.paths as Record<string, Record<string, unknown>>)[p]?.[m.toLowerCase()];
        if (!op) missing.push(`${m} ${p}`);
      }
    }
    expect(missing).toEqual([]);
  });

  it("answers every method on every route: served, or refused with a 405 problem (refuseOtherMethods)", () => {
    const silent: string[] = [];
    for (const f of routeFiles(API_DIR)) {
      const src = readFileSync(f, "utf8");
      const refused = /export const \{([^}]*)\} = refuseOtherMethods\(/.exec(src)?.[1].split(",").map((m) => m.trim()) ?? [];
      for (const m of METHODS) {
        const served = new RegExp(`export (const|async function|function) ${m}\\b`).test(src);
        if (!served && !refused.includes(m)) silent.push(`${m} ${openApiPath(f)}`);
      }
    }
    expect(silent).toEqual([]);
  });

  it("gives every operation a summary, a description, an operationId and an example for its success response", () => {
    for (const [p, item] of Object.entries(doc.paths ?? {})) {
      for (const [method, op] of Object.entries(item as Record<string, any>)) {
        expect(op.summary, `${method} ${p}`).toBeTruthy();
        expect(op.description, `${method} ${p}`).toBeTruthy();
        expect(op.operationId, `${method} ${p}`).toBeTruthy();
        const ok = Object.entries(op.responses).find(([s]) => s.startsWith("2"));
        expect(ok, `${method} ${p}`).toBeTruthy();
        const content = (ok![1] as any).content?.["application/json"];
        if (p !== "/api/v1/openapi.json") {
          expect(content?.example, `${method} ${p} example`).toBeTruthy();
        }
      }
    }
  });

  it("documents the problem responses of the keyed routes", () => {
    const post = (doc.paths as any)["/api/v1/gradings"].post;
    for (const s of ["400", "401", "403", "409", "413", "415", "422", "429", "503"]) {
      expect(post.responses[s]?.content?.["application/problem+json"], s).toBeTruthy();
    }
  });
});
