import path from "node:path";
import { describe, expect, it } from "vitest";
import { sharedBrowser } from "../helpers/browser";
import { APP_URL } from "../helpers/test-env";

describe("landing page in Chromium", () => {
  const browser = sharedBrowser();

  it("tells a visitor what Glassgrade does, shows the laser-safety caution and links to sign-in", async () => {
    const page = await browser().newPage({ viewport: { width: 1280, height: 900 } });
    const res = await page.goto(APP_URL + "/");
    expect(res?.status()).toBe(200);
    await expect(page.title()).resolves.toBe("Glassgrade");
    const h1 = await page.locator("h1").innerText();
    expect(h1).toMatch(/fibre link/i);
    const note = page.getByRole("note", { name: "Laser safety" });
    expect(await note.innerText()).toMatch(/Never look into a fibre end/);
    expect(await page.getByRole("link", { name: "Sign in" }).getAttribute("href")).toBe("/console");
    // The font comes from the app itself, not a font service.
    const family = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
    expect(family.toLowerCase()).toContain("inter");
    await page.screenshot({ path: path.resolve(import.meta.dirname, "../../docs/screenshots/landing.png"), fullPage: true });
    await page.close();
  });
});
