import { describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { devMailbox, users } from "@/db/schema";
import { verifyPassword } from "@/lib/auth/password";
import { isResetTokenValid, requestPasswordReset, resetPassword } from "@/lib/auth/password-reset";
import { firstLink } from "@/lib/mail/templates";
import { createOrganisation, createUser } from "../../helpers/factories";
import { waitForMail } from "./support";

describe("password reset by e-mail", () => {
  it("mails a link that sets a new password once", async () => {
    const org = await createOrganisation();
    const u = await createUser(org, "engineer", { passwordHash: "$2b$04$abcdefghijklmnopqrstuuJ4O0gk7tP2Cmn8hC3nwfLk1R0y4k1Mm" });
    await requestPasswordReset({ email: u.email.toUpperCase() });
    const mail = await waitForMail(u.email);
    const token = /\/reset-password\/([A-Za-z0-9_-]+)$/.exec(firstLink(mail.body)!)![1];
    await expect(isResetTokenValid(token)).resolves.toBe(true);
    await expect(resetPassword({ token, password: "new and long password", confirm: "does not match" })).rejects.toMatchObject({ name: "ZodError" });
    await resetPassword({ token, password: "new and long password", confirm: "new and long password" });
    const [row] = await getDb().select().from(users).where(eq(users.id, u.id));
    await expect(verifyPassword("new and long password", row.passwordHash)).resolves.toBe(true);
    await expect(isResetTokenValid(token)).resolves.toBe(false);
    await expect(resetPassword({ token, password: "third long password", confirm: "third long password" })).rejects.toMatchObject({ name: "NotFoundError" });
  });

  it("answers the same for an unknown address and sends nothing", async () => {
    const email = `nobody-${crypto.randomUUID().slice(0, 6)}@test.example`;
    await expect(requestPasswordReset({ email })).resolves.toBeUndefined();
    await new Promise((r) => setTimeout(r, 500));
    const rows = await getDb().select().from(devMailbox).where(sql`lower(${devMailbox.to}) = ${email}`);
    expect(rows).toHaveLength(0);
  });
});
