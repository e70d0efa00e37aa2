// Inviting a member end to end: the admin invites, the mail arrives at the fake SMTP server and shows in
// the development mailbox, the link opens the accept page, and the new member signs in with their role.
import { describe, expect, it } from "vitest";
import { sharedBrowser } from "../helpers/browser";
import { screenshot, signIn } from "../helpers/console-browser";
import { APP_URL } from "../helpers/test-env";

describe("members and invitations in Chromium", () => {
  const browser = sharedBrowser();

  it("invites by e-mail, follows the mailed link, and the new member signs in", async () => {
    const email = `splicer-${Date.now()}@northmere.example`;
    const admin = await signIn(browser(), "admin@northmere.example");
    await admin.goto(`${APP_URL}/console/members`);
    const form = admin.getByRole("form", { name: "Invite a member" });
    await form.getByLabel("E-mail").fill(email);
    await form.getByLabel("Role").selectOption("engineer");
    await form.getByRole("button", { name: "Send invitation" }).click();
    await admin.getByText(`Invitation sent to ${email}.`).waitFor();
    await admin.getByRole("row").filter({ hasText: email }).waitFor();
    await screenshot(admin, "console-members");

    await admin.getByRole("link", { name: "Open the development mailbox" }).click();
    await admin.waitForURL(`${APP_URL}/console/mailbox`);
    await admin.getByLabel("Recipient contains").fill(email);
    const item = admin.getByRole("button", { name: /You are invited to Northmere Fibre/ });
    await item.waitFor({ timeout: 15_000 });
    await item.click();
    const link = admin.getByRole("link", { name: /\/invite\// });
    const href = await link.getAttribute("href");
    expect(href).toMatch(new RegExp(`^${APP_URL.replace(/[.]/g, "\\.")}/invite/[A-Za-z0-9_-]{43}$`));
    await screenshot(admin, "console-mailbox");

    const guest = await browser().newPage({ viewport: { width: 1280, height: 800 } });
    await guest.goto(href!);
    await guest.getByRole("heading", { name: "Join Northmere Fibre" }).waitFor();
    await guest.getByLabel("Your name").fill("Maren Holt");
    await guest.getByLabel("Choose a password").fill("short");
    await guest.getByRole("button", { name: "Accept and create account" }).click();
    await guest.getByText("Use at least 12 characters.").waitFor();
    await guest.getByLabel("Choose a password").fill("spool of dark fibre");
    await guest.getByRole("button", { name: "Accept and create account" }).click();
    await guest.waitForURL(/\/sign-in\?joined=1/);
    await guest.close();

    const joined = await signIn(browser(), email, "spool of dark fibre");
    await expect(joined.getByTestId("role").textContent()).resolves.toBe("engineer");
    await joined.close();

    // The link works once.
    const again = await browser().newPage();
    await again.goto(href!);
    await again.getByText("This invitation no longer works").waitFor();
    await again.close();

    // The admin changes the new member's role; the server has it afterwards.
    await admin.goto(`${APP_URL}/console/members`);
    await admin.getByLabel("Role of Maren Holt").selectOption("auditor");
    await admin.getByRole("button", { name: "Save role of Maren Holt" }).click();
    await expect
      .poll(() => admin.evaluate(async (mail) => {
        const body = await (await fetch("/api/console/members")).json();
        return body.members.find((m: { email: string }) => m.email === mail)?.role;
      }, email), { timeout: 10_000 })
      .toBe("auditor");
    await admin.close();
  });
});
