// Browser steps shared by the console e2e tests.
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { APP_URL } from "./test-env";

export const DEMO_PASSWORD = "glassgrade-demo";
const SHOTS = path.resolve(import.meta.dirname, "../../docs/screenshots");

export async function signIn(browser: Browser, email: string, password = DEMO_PASSWORD, viewport = { width: 1280, height: 860 }): Promise<Page> {
  const page = await browser.newPage({ viewport });
  await page.goto(`${APP_URL}/console`);
  // The proxy sends a visitor without a session to our sign-in page.
  await page.waitForURL(/\/sign-in\?callbackUrl=/);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`${APP_URL}/console`);
  return page;
}

export async function screenshot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: path.join(SHOTS, `${name}.png`), fullPage: true });
}
