// What each demo role sees, and that the server refuses what the sidebar hides.
import { describe, expect, it } from "vitest";
import { sharedBrowser } from "../helpers/browser";
import { screenshot, signIn } from "../helpers/console-browser";
import { APP_URL } from "../helpers/test-env";

// The console items this suite is about; other pages add their own links, checked by their own tests.
const CONSOLE_ITEMS = ["Overview", "API keys", "Call log", "Members", "Retention", "Mailbox (dev)", "API reference"];
const NAV: Record<string, string[]> = {
  "engineer@northmere.example": ["Overview", "API keys", "Call log", "Mailbox (dev)", "API reference"],
  "auditor@northmere.example": ["Overview", "Call log", "Mailbox (dev)", "API reference"],
  "developer@northmere.example": ["Overview", "API keys", "Call log", "Mailbox (dev)", "API reference"],
};

describe("console roles in Chromium", () => {
  const browser = sharedBrowser();

  it("sends a visitor without a session to sign-in and rejects a wrong password", async () => {
    const page = await browser().newPage({ viewport: { width: 1280, height: 800 } });
    await page.goto(`${APP_URL}/console/keys`);
    await page.waitForURL(/\/sign-in\?callbackUrl=%2Fconsole%2Fkeys/);
    await page.getByLabel("E-mail").fill("admin@northmere.example");
    await page.getByLabel("Password").fill("not the password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.getByText("Sign-in failed").waitFor();
    expect(page.url()).toContain("/sign-in");
    await screenshot(page, "sign-in");
    await page.close();
  });

  for (const [email, labels] of Object.entries(NAV)) {
    it(`${email.split("@")[0]} sees only their pages`, async () => {
      const page = await signIn(browser(), email);
      const nav = page.getByRole("navigation", { name: "Console" });
      const shown = await nav.getByRole("link").allTextContents();
      expect(shown.filter((l) => CONSOLE_ITEMS.includes(l))).toEqual(labels);
      await page.close();
    });
  }

  it("an auditor is denied the keys and members pages with 403, and the console API refuses too", async () => {
    const page = await signIn(browser(), "auditor@northmere.example");
    for (const path of ["/console/keys", "/console/members", "/console/retention"]) {
      const res = await page.goto(`${APP_URL}${path}`);
      expect(res?.status()).toBe(403);
      await expect(page.getByRole("heading", { name: "Not available for your role" }).count()).resolves.toBe(1);
    }
    await screenshot(page, "console-forbidden");
    const api = await page.evaluate(async () => {
      const r = await fetch("/api/console/keys");
      return { status: r.status, body: await r.json() };
    });
    expect(api.status).toBe(403);
    expect(api.body.code).toBe("forbidden");
    await page.close();
  });

  it("a developer may only create sandbox keys, and works at tablet width", async () => {
    const page = await signIn(browser(), "developer@northmere.example", undefined, { width: 820, height: 1100 });
    await page.goto(`${APP_URL}/console/keys`);
    await page.getByRole("button", { name: "Create key", exact: true }).first().click();
    const env = page.getByRole("dialog", { name: "Create an API key" }).getByLabel("Environment");
    const options = await env.locator("option").allInnerTexts();
    expect(options).toEqual(["Sandbox (gg_sbx_)"]);
    await screenshot(page, "console-keys-tablet");
    await page.close();
  });

  it("console JSON routes answer 401 without a session and 422 for an invalid filter, as problem+json", async () => {
    const anon = await fetch(`${APP_URL}/api/console/call-log`);
    expect(anon.status).toBe(401);
    expect(anon.headers.get("content-type")).toContain("application/problem+json");
    const page = await signIn(browser(), "auditor@northmere.example");
    const bad = await page.evaluate(async () => {
      const r = await fetch("/api/console/call-log?status=7xx&keyId=nope");
      return { status: r.status, type: r.headers.get("content-type"), body: await r.json() };
    });
    expect(bad.status).toBe(422);
    expect(bad.type).toContain("application/problem+json");
    expect(bad.body.errors.map((e: { pointer: string }) => e.pointer).sort()).toEqual(["/keyId", "/status"]);
    await page.close();
  });

  it("signs out back to the sign-in page, after which /console needs a session again", async () => {
    const page = await signIn(browser(), "engineer@northmere.example");
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL(/\/sign-in\?signedOut=1/);
    await page.goto(`${APP_URL}/console`);
    await page.waitForURL(/\/sign-in\?callbackUrl=/);
    await page.close();
  });
});
