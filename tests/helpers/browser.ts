import { chromium, type Browser } from "playwright-core";
import { afterAll, beforeAll } from "vitest";

// Debian's Chromium, with the flags that keep it off the (closed) network.
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-dev-shm-usage",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
}

/**
 * One Chromium for the enclosing describe block: launched before its tests, closed after them. Call it at
 * the top of the block and read the browser through the returned getter.
 */
export function sharedBrowser(): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });
  return () => {
    if (!browser) throw new Error("the browser is launched in beforeAll; use it inside a test");
    return browser;
  };
}
