// The API over real HTTP (supertest against `next start`) and the API reference page in Chromium.
import request from "supertest";
import { describe, expect, it } from "vitest";
import { DEMO_SANDBOX_KEY } from "@/db/seed-demo-gradings";
import { sharedBrowser } from "../helpers/browser";
import { screenshot, signIn } from "../helpers/console-browser";
import { APP_URL } from "../helpers/test-env";
import { passingTest } from "../integration/api/v1/fixtures";

describe("API over HTTP", () => {
  const api = () => request(APP_URL);

  it("grades with the seeded demo sandbox key and serves the verdict at Location", async () => {
    const res = await api()
      .post("/api/v1/gradings")
      .set("Authorization", `Bearer ${DEMO_SANDBOX_KEY}`)
      .send({ test: passingTest("E2E-HTTP-1") })
      .expect(201);
    expect(res.headers["x-request-id"]).toMatch(/^req_/);
    expect(res.headers["ratelimit-limit"]).toBeDefined();
    const got = await api().get(res.headers.location).set("Authorization", `Bearer ${DEMO_SANDBOX_KEY}`).expect(200);
    expect(got.body.id).toBe(res.body.id);
  });

  it("413 for an oversized raw body, before any parsing", async () => {
    const res = await api()
      .post("/api/v1/gradings")
      .set("Authorization", `Bearer ${DEMO_SANDBOX_KEY}`)
      .set("Content-Type", "application/json")
      .send("[" + "0,".repeat(700_000) + "0]");
    expect(res.status).toBe(413);
    expect(res.headers["content-type"]).toBe("application/problem+json");
    expect(res.body.code).toBe("payload_too_large");
  });

  it("400 for a raw body that is not JSON, 415 for a form post, 401 without a key", async () => {
    const bad = await api().post("/api/v1/gradings").set("Authorization", `Bearer ${DEMO_SANDBOX_KEY}`).set("Content-Type", "application/json").send("{oops");
    expect(bad.status).toBe(400);
    const form = await api().post("/api/v1/gradings").set("Authorization", `Bearer ${DEMO_SANDBOX_KEY}`).type("form").send({ a: "b" });
    expect(form.status).toBe(415);
    const anon = await api().get("/api/v1/verdicts").expect(401);
    expect(anon.body.requestId).toBe(anon.headers["x-request-id"]);
  });

  it("serves the OpenAPI 3.1 document", async () => {
    const res = await api().get("/api/v1/openapi.json").expect(200);
    expect(res.body.openapi).toBe("3.1.0");
    expect(Object.keys(res.body.paths)).toContain("/api/v1/gradings");
  });
});

describe("API reference page in Chromium", () => {
  const browser = sharedBrowser();

  it("shows the quickstart and the operations to a visitor, without try-it", async () => {
    const page = await browser().newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(`${APP_URL}/docs/api`);
    await expect(page.locator("h1").innerText()).resolves.toBe("API reference");
    expect(await page.getByText("curl -sS").count()).toBeGreaterThan(0);
    await page.locator(".opblock-summary-path", { hasText: "/api/v1/gradings/batch" }).first().waitFor({ timeout: 30_000 });
    expect(await page.getByRole("note").first().innerText()).toMatch(/Sign in/);
    expect(await page.getByRole("note", { name: "Laser safety" }).count()).toBe(1);
    await page.close();
  });

  it("lets a signed-in developer try a call with the sandbox key", async () => {
    const page = await signIn(browser(), "developer@northmere.example");
    const errors: string[] = [];
    page.on("pageerror", (e) => errors.push(e.message));
    await page.goto(`${APP_URL}/docs/api`);
    await expect(page.getByRole("note").first().innerText()).resolves.toMatch(/Try-it is on/);
    await page.locator("button.authorize").first().click();
    await page.locator(".auth-container input").first().fill(DEMO_SANDBOX_KEY);
    await page.locator(".auth-btn-wrapper button.authorize").click();
    await page.locator(".auth-btn-wrapper button", { hasText: "Close" }).click();
    const op = page.locator(".opblock", { has: page.locator(".opblock-summary-path", { hasText: /^\/api\/v1\/profiles$/ }) });
    await op.locator(".opblock-summary").click();
    await op.getByRole("button", { name: "Try it out" }).click();
    await op.getByRole("button", { name: "Execute" }).click();
    const status = op.locator(".live-responses-table tbody .response-col_status").first();
    await status.waitFor({ timeout: 30_000 });
    expect((await status.innerText()).trim()).toBe("200");
    expect(errors).toEqual([]);
    await screenshot(page, "api-reference");
    await page.close();
  });
});
