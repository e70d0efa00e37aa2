// A person who belongs to two organisations works in one at a time and switches in the top bar; what
// they see (and their role) follows the organisation.
import bcrypt from "bcryptjs";
import { describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { desc, sql } from "drizzle-orm";
import { devMailbox, memberships } from "@/db/schema";
import { inviteMember } from "@/lib/members/invitations";
import { firstLink } from "@/lib/mail/templates";
import { sharedBrowser } from "../helpers/browser";
import { signIn } from "../helpers/console-browser";
import { createOrganisation, createUser } from "../helpers/factories";
import { APP_URL } from "../helpers/test-env";

describe("members of several organisations", () => {
  const browser = sharedBrowser();

  it("switches organisation and role from the top bar", async () => {
    const first = await createOrganisation({ name: "Aldmoor Fibre Co-op" });
    const second = await createOrganisation({ name: "Wrenfield Splicing" });
    const user = await createUser(first, "admin", { passwordHash: await bcrypt.hash("two hats long password", 4) });
    await getDb().insert(memberships).values({ organisationId: second.id, userId: user.id, role: "auditor" });

    const page = await signIn(browser(), user.email, "two hats long password");
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

  it("someone with an account joins a second organisation from an invitation without a new password", async () => {
    const home = await createOrganisation({ name: "Tarnbeck Telecom" });
    const host = await createOrganisation({ name: "Skerry Point Fibre" });
    const person = await createUser(home, "engineer", { passwordHash: await bcrypt.hash("my only long password", 4) });
    const hostAdmin = await createUser(host, "admin");
    await inviteMember(
      { actor: { userId: hostAdmin.id, email: hostAdmin.email, name: hostAdmin.name, organisationId: host.id, organisationName: host.name, role: "admin" } },
      { email: person.email, role: "developer" },
    );
    let link: string | null = null;
    for (let i = 0; i < 100 && !link; i++) {
      const [m] = await getDb().select().from(devMailbox).where(sql`lower(${devMailbox.to}) = ${person.email}`).orderBy(desc(devMailbox.id)).limit(1);
      link = m ? firstLink(m.body) : null;
      if (!link) await new Promise((r) => setTimeout(r, 100));
    }
    expect(link).toMatch(/\/invite\//);

    const guest = await browser().newPage();
    await guest.goto(link!);
    await guest.getByText("You already have an account").waitFor();
    await expect(guest.getByLabel("Choose a password").count()).resolves.toBe(0);
    await guest.getByRole("button", { name: "Join the organisation" }).click();
    await guest.waitForURL(/\/sign-in\?joined=1/);
    await guest.close();

    const page = await signIn(browser(), person.email, "my only long password");
    const options = await page.getByLabel("Organisation").locator("option").allTextContents();
    expect(options.sort()).toEqual(["Skerry Point Fibre", "Tarnbeck Telecom"]);
    await page.close();
  });
});
