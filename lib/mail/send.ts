import nodemailer, { type Transporter } from "nodemailer";
import { mailConfig } from "./config";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

let cached: { server: string; transport: Transporter } | undefined;

function transport(): Transporter {
  const { server } = mailConfig();
  // An SMTP URL string, not an object: next-auth-style object configs merge in an empty `auth` that the
  // fake receiver (and many relays) reject.
  if (!cached || cached.server !== server) cached = { server, transport: nodemailer.createTransport(server) };
  return cached.transport;
}

/** Sends one plain-text message. Throws when the relay refuses it, so callers can say the mail failed. */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  await transport().sendMail({ from: mailConfig().from, to: mail.to, subject: mail.subject, text: mail.text });
}
