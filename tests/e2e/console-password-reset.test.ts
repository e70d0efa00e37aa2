// Forgotten password in Chromium: ask for a link, read it from the fake SMTP server, set a new password,
// sign in with it; the old password and the used link stop working.
import bcrypt from "bcryptjs";
import { desc, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { devMailbox } from "@/db/schema";
import { firstLink } from "@/lib/mail/templates";
import { sharedBrowser } from "../helpers/browser";
import { screenshot, signIn } from "../helpers/console-browser";
import { createOrganisation, createUser } from "../helpers/factories";
import { APP_URL } from "../helpers/test-env";

async function mailTo(email: string): Promise<string> {
  for (let i = 0; i < 100; i++) {
    const [m] = await getDb().select().from(devMailbox).where(sql`lower(${devMailbox.to}) = ${email}`).orderBy(desc(devMailbox.id)).limit(1);
    if (m) return m.body;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${email}`);
}

describe("password reset in Chromium", () => {
  const browser = sharedBrowser();

  it("resets the password through the mailed link", async () => {
    const org = await createOrganisation({ name: "Hollin Ridge Networks" });
    const user = await createUser(org, "developer", { passwordHash: await bcrypt.hash("original long password", 4) });

    const page = await browser().newPage({ viewport: { width: 1280, height: 800 } });
    await page.goto(`${APP_URL}/sign-in`);
    await page.getByRole("link", { name: "Forgot your password?" }).click();
    await page.waitForURL(`${APP_URL}/forgot-password`);
    await page.getByLabel("E-mail").fill(user.email);
    await page.getByRole("button", { name: "Send reset link" }).click();
    await page.getByText("a reset link is on its way").waitFor();

    const link = firstLink(await mailTo(user.email));
    expect(link).toMatch(/\/reset-password\/[A-Za-z0-9_-]{43}$/);
    await page.goto(link!);
    await page.getByLabel("New password", { exact: true }).fill("a brand new passphrase");
    await page.getByLabel("New password again").fill("a different passphrase");
    await page.getByRole("button", { name: "Set new password" }).click();
    await page.getByText("The two passwords differ.").waitFor();
    await page.getByLabel("New password again").fill("a brand new passphrase");
    await screenshot(page, "reset-password");
    await page.getByRole("button", { name: "Set new password" }).click();
    await page.waitForURL(/\/sign-in\?reset=1/);

    await page.getByLabel("E-mail").fill(user.email);
    await page.getByLabel("Password").fill("original long password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.getByText("Sign-in failed").waitFor();
    await page.close();

    const signedIn = await signIn(browser(), user.email, "a brand new passphrase");
    await expect(signedIn.getByTestId("org-name").innerText()).resolves.toBe("Hollin Ridge Networks");
    await signedIn.close();

    const again = await browser().newPage();
    await again.goto(link!);
    await again.getByText("This link no longer works").waitFor();
    await again.close();
  });
});
