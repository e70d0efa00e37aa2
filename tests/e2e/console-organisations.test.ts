// A person who belongs to two organisations works in one at a time and switches in the top bar; what
// they see (and their role) follows the organisation.
import bcrypt from "bcryptjs";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { memberships } from "@/db/schema";
import { launchBrowser } from "../helpers/browser";
import { signIn } from "../helpers/console-browser";
import { createOrganisation, createUser } from "../helpers/factories";
import { APP_URL } from "../helpers/test-env";

describe("members of several organisations", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("switches organisation and role from the top bar", async () => {
    const first = await createOrganisation({ name: "Aldmoor Fibre Co-op" });
    const second = await createOrganisation({ name: "Wrenfield Splicing" });
    const user = await createUser(first, "admin", { passwordHash: await bcrypt.hash("two hats long password", 4) });
    await getDb().insert(memberships).values({ organisationId: second.id, userId: user.id, role: "auditor" });

    const page = await signIn(browser, user.email, "two hats long password");
    const picker = page.getByLabel("Organisation");
    await expect(picker.inputValue()).resolves.toBe(first.id);
    await expect(page.getByTestId("role").textContent()).resolves.toBe("admin");
    await expect(page.getByRole("navigation", { name: "Console" }).getByRole("link", { name: "Members" }).count()).resolves.toBe(1);

    await picker.selectOption(second.id);
    await page.getByTestId("role").filter({ hasText: "auditor" }).waitFor();
    await expect(page.getByRole("navigation", { name: "Console" }).getByRole("link", { name: "Members" }).count()).resolves.toBe(0);
    // The server follows the switch too: the auditor role may not open the members page.
    const res = await page.goto(`${APP_URL}/console/members`);
    expect(res?.status()).toBe(403);
    await page.close();
  });
});
