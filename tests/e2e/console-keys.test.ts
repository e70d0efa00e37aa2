// The key lifecycle in Chromium: sign in, create a key, call the API with it, find the call in the call
// log, revoke the key and see the next call refused.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser } from "../helpers/browser";
import { screenshot, signIn } from "../helpers/console-browser";
import { APP_URL } from "../helpers/test-env";

describe("API keys and call log in the console", () => {
  let browser: Browser;
  let page: Page;
  let secret = "";
  const keyName = `E2E work-order system ${Date.now()}`;

  beforeAll(async () => {
    browser = await launchBrowser();
    page = await signIn(browser, "admin@northmere.example");
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("shows the admin's organisation, role and the full navigation", async () => {
    await expect(page.getByTestId("org-name").innerText()).resolves.toBe("Northmere Fibre");
    await expect(page.getByTestId("role").textContent()).resolves.toBe("admin");
    const nav = page.getByRole("navigation", { name: "Console" });
    for (const label of ["Overview", "API keys", "Call log", "Members", "Mailbox (dev)", "API reference"]) {
      await expect(nav.getByRole("link", { name: label }).count()).resolves.toBe(1);
    }
    await expect(page.getByRole("heading", { name: "Overview" }).count()).resolves.toBe(1);
    await screenshot(page, "console-overview");
  });

  it("creates a sandbox key and shows its secret once", async () => {
    await page.getByRole("navigation", { name: "Console" }).getByRole("link", { name: "API keys" }).click();
    await page.waitForURL(`${APP_URL}/console/keys`);
    await page.getByRole("button", { name: "Create key", exact: true }).first().click();
    const dialog = page.getByRole("dialog", { name: "Create an API key" });
    // Submitting without a name shows the schema's message next to the field and creates nothing.
    await dialog.getByRole("button", { name: "Create key" }).click();
    await expect(dialog.getByText("Give the key a name.").count()).resolves.toBe(1);
    await dialog.getByLabel("Name").fill(keyName);
    await dialog.getByRole("button", { name: "Create key" }).click();
    const shown = page.getByTestId("new-key-secret");
    await shown.waitFor();
    secret = await shown.inputValue();
    expect(secret).toMatch(/^gg_sbx_[0-9A-Za-z]{43}$/);
    await screenshot(page, "console-key-created");
    await page.getByRole("button", { name: "I have stored it" }).click();
    const row = page.getByRole("row").filter({ hasText: keyName });
    await expect(row.count()).resolves.toBe(1);
    // The list shows only the start of the key, never the secret.
    expect(await row.innerText()).toContain(secret.slice(0, 11));
    expect(await page.content()).not.toContain(secret);
  });

  it("the key works against the API and the call appears in the call log", async () => {
    const res = await fetch(`${APP_URL}/api/v1/verdicts`, { headers: { authorization: `Bearer ${secret}` } });
    expect(res.status).toBe(200);
    const requestId = res.headers.get("x-request-id");
    expect(requestId).toBeTruthy();

    await page.getByRole("navigation", { name: "Console" }).getByRole("link", { name: "Call log" }).click();
    await page.waitForURL(`${APP_URL}/console/call-log`);
    // Filter to the new key (the menu lists keys seen in the log, so the call must be there already).
    const option = page.locator("option", { hasText: keyName });
    await option.waitFor({ state: "attached" });
    await page.getByLabel("Key", { exact: true }).selectOption((await option.getAttribute("value"))!);
    const row = page.getByRole("row").filter({ hasText: "/api/v1/verdicts" }).first();
    await row.waitFor();
    expect(await row.innerText()).toContain("200");
    await row.click();
    const detail = page.getByRole("complementary", { name: "Call detail" });
    await expect(detail.getByTestId("call-request-id").innerText()).resolves.toBe(requestId);
    await screenshot(page, "console-call-log");

    // The CSV export carries the same filtered rows.
    const exportHref = await page.getByRole("link", { name: "Export CSV" }).getAttribute("href");
    const csv = await page.evaluate(async (href) => (await fetch(href!)).text(), exportHref);
    const lines = csv.trim().split("\r\n");
    expect(lines[0]).toBe("createdAt,method,route,path,status,latencyMs,requestId,keyName,keyStart,userName,verdictId,problemType");
    expect(lines).toHaveLength(2);
    expect(lines[1]).toContain(requestId!);
  });

  it("revoking the key makes the next call fail with 401", async () => {
    await page.getByRole("navigation", { name: "Console" }).getByRole("link", { name: "API keys" }).click();
    await page.waitForURL(`${APP_URL}/console/keys`);
    await page.getByRole("button", { name: `Revoke ${keyName}` }).click();
    const confirm = page.getByRole("dialog", { name: "Revoke this key?" });
    await confirm.getByRole("button", { name: "Revoke key" }).click();
    await page.getByRole("row").filter({ hasText: keyName }).getByText("revoked").waitFor();
    const res = await fetch(`${APP_URL}/api/v1/verdicts`, { headers: { authorization: `Bearer ${secret}` } });
    expect(res.status).toBe(401);
    expect(res.headers.get("content-type")).toContain("application/problem+json");
    await screenshot(page, "console-keys");
  });
});
