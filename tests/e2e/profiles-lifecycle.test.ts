// The engineer's and the auditor's work in Chromium: tighten a limit in a draft, preview its impact,
// publish, grade through the API under the new version, see it on the verdict page; an auditor replays it.
import path from "node:path";
import { eq } from "drizzle-orm";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getDb, closeDb } from "@/db";
import { organisations } from "@/db/schema";
import { launchBrowser } from "../helpers/browser";
import { screenshot, signIn } from "../helpers/console-browser";
import { createApiKey } from "../helpers/factories";
import { syntheticLinkTests } from "../helpers/synthetic-links";
import { APP_URL } from "../helpers/test-env";

const SLUG = `e2e-feeder-${Date.now().toString(36)}`;

describe("limit profile lifecycle and replay in the console", () => {
  let browser: Browser;
  let engineer: Page;
  let key = "";
  let verdictId = "";

  beforeAll(async () => {
    const [org] = await getDb().select().from(organisations).where(eq(organisations.slug, "northmere"));
    key = (await createApiKey(org, { scopes: ["grade", "verdicts:read", "profiles:read"] })).secret;
    browser = await launchBrowser();
    engineer = await signIn(browser, "engineer@northmere.example");
  });
  afterAll(async () => {
    await browser?.close();
    await closeDb();
  });

  it("clones a template into a draft from the profiles page", async () => {
    await engineer.getByRole("navigation", { name: "Console" }).getByRole("link", { name: "Profiles" }).click();
    await engineer.waitForURL(`${APP_URL}/console/profiles`);
    // The console shows a loading state while the page renders: wait for the heading, not the URL.
    await engineer.getByRole("heading", { name: "Limit profiles" }).waitFor();
    // The demo seed's own profile is listed with its latest version.
    expect(await engineer.getByRole("row").filter({ hasText: "northmere-feeder" }).innerText()).toContain("v2");
    await screenshot(engineer, "console-profiles");
    await engineer.getByRole("row").filter({ hasText: "tia-568-3-d-singlemode-osp" }).getByRole("button", { name: /^Clone/ }).click();
    const dialog = engineer.getByRole("dialog");
    await dialog.getByLabel("Slug").fill(SLUG);
    await dialog.getByRole("button", { name: "Create draft" }).click();
    await engineer.waitForURL(`${APP_URL}/console/profiles/${SLUG}/draft`);
    await engineer.getByRole("heading", { name: /draft of v1/ }).waitFor();
  });

  it("marks an impossible value on its field, then saves a tighter splice limit", async () => {
    const splice = engineer.getByRole("group", { name: "Splice", exact: true }).getByLabel("Value (dB)");
    await splice.fill("-0.1");
    await splice.blur();
    await engineer.getByRole("group", { name: "Splice", exact: true }).getByText(/at least 0 dB/).waitFor();
    await splice.fill("0.15");
    await engineer.getByRole("group", { name: "Splice", exact: true }).getByLabel("Source").fill("Northmere e2e: tightened for the test");
    await engineer.getByRole("button", { name: "Save draft" }).click();
    await engineer.getByText("Draft saved.").waitFor();
  });

  it("previews the impact on stored tests with a progress bar and a changed-links list", async () => {
    await engineer.getByRole("button", { name: "Preview impact" }).click();
    const result = engineer.getByTestId("preview-result");
    await result.waitFor({ timeout: 30_000 });
    const text = await result.innerText();
    expect(text).toMatch(/of [\d,]+ verdicts would change/);
    const changed = Number(/([\d,]+) of/.exec(text)![1].replace(/,/g, ""));
    // A tighter splice limit on links with lossy splices must move some of them.
    expect(changed).toBeGreaterThan(0);
    await expect(engineer.getByRole("table", { name: /Verdicts now/ }).count()).resolves.toBe(1);
    await engineer.locator('section[aria-labelledby="preview-title"]').screenshot({ path: path.resolve(import.meta.dirname, "../../docs/screenshots/console-impact-preview.png") });
    await screenshot(engineer, "console-profile-draft");
  });

  it("publishes version 1 with a change note", async () => {
    await engineer.getByLabel("Change note").fill("Splices to 0.15 dB (end-to-end test)");
    await engineer.getByRole("button", { name: "Publish version 1" }).click();
    await engineer.waitForURL(new RegExp(`/console/profiles/${SLUG}\\?published=1`));
    await engineer.getByText(/Version 1 is published\./).waitFor();
    expect(await engineer.getByRole("row").filter({ hasText: `${SLUG}@1` }).innerText()).toContain("Splices to 0.15 dB");
  });

  it("grades through the API under the new version and shows it on the verdict page", async () => {
    const [test] = syntheticLinkTests(1, 99);
    const res = await fetch(`${APP_URL}/api/v1/gradings`, {
      method: "POST",
      headers: { authorization: `Bearer ${key}`, "content-type": "application/json" },
      body: JSON.stringify({ profile: SLUG, test }),
    });
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body.profile).toEqual({ slug: SLUG, version: 1 });
    verdictId = body.id;

    await engineer.goto(`${APP_URL}/console/verdicts/${verdictId}`);
    await engineer.getByTestId("verdict-profile").waitFor();
    await expect(engineer.getByTestId("verdict-profile").innerText()).resolves.toBe(`${SLUG}@1`);
    await expect(engineer.getByRole("img", { name: /Event map of/ }).count()).resolves.toBe(1);
    await expect(engineer.getByRole("img", { name: /Loss budget against measured/ }).count()).resolves.toBe(1);
    await expect(engineer.getByRole("note", { name: "Laser safety" }).count()).resolves.toBe(1);
    await screenshot(engineer, "console-verdict");
  });

  it("lets an auditor replay the verdict and verify the chain", async () => {
    const auditor = await signIn(browser, "auditor@northmere.example");
    await auditor.goto(`${APP_URL}/console/verdicts/${verdictId}`);
    await auditor.getByRole("button", { name: "Replay this verdict" }).click();
    const outcome = auditor.locator("[data-replay]");
    await outcome.waitFor();
    await expect(outcome.getAttribute("data-replay")).resolves.toBe("reproduced");
    // Auditors read profiles but cannot edit them: no clone buttons.
    await auditor.goto(`${APP_URL}/console/profiles`);
    await auditor.getByRole("heading", { name: "Built-in templates" }).waitFor();
    await expect(auditor.getByRole("button", { name: /^Clone/ }).count()).resolves.toBe(0);

    await auditor.goto(`${APP_URL}/console/audit`);
    await auditor.getByRole("button", { name: "Verify chain" }).click();
    await auditor.locator("[data-chain]").waitFor({ timeout: 30_000 });
    await expect(auditor.locator("[data-chain]").getAttribute("data-chain")).resolves.toBe("intact");
    await auditor.getByRole("button", { name: "Replay", exact: true }).click();
    await auditor.getByTestId("bulk-replay-result").waitFor({ timeout: 30_000 });
    await expect(auditor.locator('[data-count="changed"]').innerText()).resolves.toBe("0");
    await screenshot(auditor, "console-audit");
  });
});
