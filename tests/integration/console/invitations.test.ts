// Invitation by e-mail: the message reaches the fake SMTP receiver, the link in it works once, and the
// new member can then sign in with the password they chose.
import { describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { invitations, memberships, users } from "@/db/schema";
import { verifyPassword } from "@/lib/auth/password";
import { hashToken } from "@/lib/auth/tokens";
import { acceptInvitation, inviteMember, previewInvitation } from "@/lib/members/invitations";
import { listMembers } from "@/lib/members/members";
import { firstLink } from "@/lib/mail/templates";
import { createUser } from "../../helpers/factories";
import { orgWithEveryRole, waitForMail } from "./support";

function tokenFrom(link: string): string {
  const m = /\/invite\/([A-Za-z0-9_-]+)$/.exec(link);
  if (!m) throw new Error(`not an invitation link: ${link}`);
  return m[1];
}

describe("invitations", () => {
  it("mails a working, single-use link and the new member can sign in", async () => {
    const { members } = await orgWithEveryRole();
    const email = `field-lead-${crypto.randomUUID().slice(0, 6)}@test.example`;
    const sent = await inviteMember({ actor: members.admin }, { email: email.toUpperCase(), role: "engineer" });
    expect(sent).toMatchObject({ email, mailed: true });

    const mail = await waitForMail(email);
    expect(mail.subject).toContain(members.admin.organisationName);
    expect(mail.body).toContain("as engineer");
    const link = firstLink(mail.body);
    expect(link).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/invite\//);
    const token = tokenFrom(link!);

    // Only the hash is stored.
    const [row] = await getDb().select().from(invitations).where(eq(invitations.id, sent.invitationId));
    expect(row.tokenHash).toBe(hashToken(token));
    expect(JSON.stringify(row)).not.toContain(token);

    await expect(previewInvitation(token)).resolves.toMatchObject({ email, role: "engineer", hasAccount: false });
    const accepted = await acceptInvitation({ token, name: "Aino Field", password: "a long enough passphrase" });
    const [u] = await getDb().select().from(users).where(eq(users.id, accepted.userId));
    expect(u.name).toBe("Aino Field");
    expect(u.passwordHash).toMatch(/^\$2[aby]\$12\$/); // bcrypt, cost 12
    await expect(verifyPassword("a long enough passphrase", u.passwordHash)).resolves.toBe(true);
    const list = await listMembers({ actor: members.admin });
    expect(list.find((m) => m.userId === accepted.userId)?.role).toBe("engineer");

    // Second use of the same link is refused.
    await expect(previewInvitation(token)).resolves.toBeNull();
    await expect(acceptInvitation({ token, name: "Someone Else", password: "another long passphrase" })).rejects.toMatchObject({ name: "NotFoundError" });
  });

  it("rejects short passwords and keeps the invitation open", async () => {
    const { members } = await orgWithEveryRole();
    const email = `short-${crypto.randomUUID().slice(0, 6)}@test.example`;
    await inviteMember({ actor: members.admin }, { email, role: "auditor" });
    const token = tokenFrom(firstLink((await waitForMail(email)).body)!);
    await expect(acceptInvitation({ token, name: "Short", password: "short" })).rejects.toMatchObject({ name: "ZodError" });
    await expect(previewInvitation(token)).resolves.not.toBeNull();
  });

  it("an existing account joins without its password being changed", async () => {
    const a = await orgWithEveryRole();
    const b = await orgWithEveryRole();
    const existing = await createUser(a.org, "developer", { passwordHash: "$2b$04$abcdefghijklmnopqrstuuJ4O0gk7tP2Cmn8hC3nwfLk1R0y4k1Mm" });
    await inviteMember({ actor: b.members.admin }, { email: existing.email, role: "auditor" });
    const token = tokenFrom(firstLink((await waitForMail(existing.email)).body)!);
    await expect(previewInvitation(token)).resolves.toMatchObject({ hasAccount: true });
    await acceptInvitation({ token, name: "ignored", password: "would-be takeover password" });
    const [u] = await getDb().select().from(users).where(eq(users.id, existing.id));
    expect(u.passwordHash).toBe("$2b$04$abcdefghijklmnopqrstuuJ4O0gk7tP2Cmn8hC3nwfLk1R0y4k1Mm");
    const rows = await getDb().select().from(memberships).where(eq(memberships.userId, existing.id));
    expect(rows.map((r) => r.role).sort()).toEqual(["auditor", "developer"]);
  });

  it("a new invitation to the same address replaces the old link", async () => {
    const { members } = await orgWithEveryRole();
    const email = `twice-${crypto.randomUUID().slice(0, 6)}@test.example`;
    await inviteMember({ actor: members.admin }, { email, role: "developer" });
    const first = tokenFrom(firstLink((await waitForMail(email)).body)!);
    await inviteMember({ actor: members.admin }, { email, role: "engineer" });
    const until = Date.now() + 10_000;
    let second = first;
    while (second === first && Date.now() < until) {
      second = tokenFrom(firstLink((await waitForMail(email)).body)!);
      if (second === first) await new Promise((r) => setTimeout(r, 100));
    }
    expect(second).not.toBe(first);
    await expect(previewInvitation(first)).resolves.toBeNull();
    await expect(previewInvitation(second)).resolves.toMatchObject({ role: "engineer" });
  });

  it("refuses to invite someone who is already a member", async () => {
    const { org, members } = await orgWithEveryRole();
    const u = await createUser(org, "developer");
    await expect(inviteMember({ actor: members.admin }, { email: u.email, role: "engineer" })).rejects.toMatchObject({ name: "InputError", field: "email" });
    const [n] = await getDb().select({ n: sql<number>`count(*)::int` }).from(invitations).where(eq(invitations.organisationId, org.id));
    expect(n.n).toBe(0);
  });
});
