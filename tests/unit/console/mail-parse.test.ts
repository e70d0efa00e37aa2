// The development receiver must read back exactly what nodemailer sent, in each transfer encoding it
// picks. Messages are built by nodemailer's own MIME composer, not written by hand.
import MailComposer from "nodemailer/lib/mail-composer";
import { describe, expect, it } from "vitest";
import { parseMail } from "@/lib/mail/parse";
import { firstLink, invitationMail } from "@/lib/mail/templates";

function compose(opts: { subject: string; text: string; textEncoding?: "base64" | "quoted-printable" }): Promise<string> {
  return new Promise((resolve, reject) =>
    new MailComposer({ from: "Glassgrade <no-reply@glassgrade.local>", to: "a@b.example", ...opts }).compile().build((err, msg) => (err ? reject(err) : resolve(msg.toString("utf8")))),
  );
}

describe("parseMail", () => {
  const link = "http://127.0.0.1:3000/invite/" + "A".repeat(43);
  const mail = invitationMail({ organisationName: "Calder Splice & Test", inviterName: "Rhona Calder", role: "auditor", link, expiresAt: new Date("2026-12-08T10:00:00Z") });

  for (const textEncoding of [undefined, "base64", "quoted-printable"] as const) {
    it(`round-trips subject, body and the link with ${textEncoding ?? "nodemailer's default"} encoding`, async () => {
      const raw = await compose({ ...mail, textEncoding });
      const parsed = parseMail(raw);
      expect(parsed.subject).toBe(mail.subject);
      expect(parsed.body).toBe(mail.text);
      expect(firstLink(parsed.body)).toBe(link);
      expect(parsed.to).toBe("a@b.example");
    });
  }

  it("decodes non-ASCII subjects and bodies", async () => {
    const raw = await compose({ subject: "Einladung für Jürgen – Glassgrade", text: "Grüße aus Tórshavn\nhttp://x.example/ü" });
    const parsed = parseMail(raw);
    expect(parsed.subject).toBe("Einladung für Jürgen – Glassgrade");
    expect(parsed.body).toBe("Grüße aus Tórshavn\nhttp://x.example/ü");
  });
});
