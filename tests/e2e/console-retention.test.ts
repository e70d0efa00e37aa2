import { describe, expect, it } from "vitest";
import { sharedBrowser } from "../helpers/browser";
import { screenshot, signIn } from "../helpers/console-browser";
import { APP_URL } from "../helpers/test-env";

describe("retention page in Chromium", () => {
  const browser = sharedBrowser();

  it("an admin refuses a too-short period on the field, then saves a valid one that stays after reload", async () => {
    const page = await signIn(browser(), "admin@calder.example");
    await page.goto(`${APP_URL}/console/retention`);
    const days = page.getByLabel("Keep API calls for (days)");
    await days.fill("7");
    await page.getByRole("button", { name: "Save retention" }).click();
    await page.getByText("Keep calls for at least 30 days.").waitFor();
    await days.fill("400");
    await page.getByRole("button", { name: "Save retention" }).click();
    await page.getByRole("status").getByText("Saved: calls are kept for 400 days.").waitFor();
    await screenshot(page, "console-retention");
    await page.reload();
    expect(await page.getByLabel("Keep API calls for (days)").inputValue()).toBe("400");
    await page.close();
  });
});
