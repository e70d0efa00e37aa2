import { afterAll, describe, expect, it } from "vitest";
import { GET } from "@/app/api/v1/health/route";
import { closeDb } from "@/db";
import pkg from "@/package.json";

describe("GET /api/v1/health", () => {
  afterAll(async () => {
    await closeDb();
  });

  it("reports the app version and a reachable database", async () => {
    const res = await GET(new Request("http://t/api/v1/health"));
    expect(res.status).toBe(200);
    expect(res.headers.get("x-request-id")).toBeTruthy();
    const body = await res.json();
    expect(body.version).toBe(pkg.version);
    expect(body.database.status).toBe("up");
    expect(body.status).toBe("ok");
  });

  it("answers 503 problem+json without internal text when the database is unreachable", async () => {
    const saved = process.env.DATABASE_URL;
    await closeDb();
    // Port 9 (discard) on loopback: nothing listens there, so the connection is refused.
    process.env.DATABASE_URL = "postgres://postgres@127.0.0.1:9/nowhere";
    try {
      const res = await GET(new Request("http://t/api/v1/health"));
      expect(res.status).toBe(503);
      expect(res.headers.get("content-type")).toBe("application/problem+json");
      const body = await res.json();
      expect(body.code).toBe("database_unavailable");
      expect(body.status).toBe(503);
      expect(JSON.stringify(body)).not.toMatch(/ECONNREFUSED|127\.0\.0\.1:9/);
    } finally {
      await closeDb();
      process.env.DATABASE_URL = saved;
    }
  });
});
