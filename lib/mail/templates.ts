// The text of every e-mail we send, in one place so wording stays consistent.

export function invitationMail(p: { organisationName: string; inviterName: string; role: string; link: string; expiresAt: Date }) {
  return {
    subject: `You are invited to ${p.organisationName} on Glassgrade`,
    text: [
      `${p.inviterName} invited you to join ${p.organisationName} on Glassgrade as ${p.role}.`,
      "",
      "Accept the invitation and choose your password here:",
      p.link,
      "",
      `The link works once and expires on ${p.expiresAt.toUTCString()}.`,
      "If you did not expect this, ignore this message.",
    ].join("\n"),
  };
}

export function passwordResetMail(p: { name: string; link: string; expiresAt: Date }) {
  return {
    subject: "Reset your Glassgrade password",
    text: [
      `Hello ${p.name},`,
      "",
      "Someone asked to reset the password of your Glassgrade account. Choose a new password here:",
      p.link,
      "",
      `The link works once and expires on ${p.expiresAt.toUTCString()}.`,
      "If it was not you, ignore this message; your password stays as it is.",
    ].join("\n"),
  };
}

/** The first http(s) link in a message body, for the mailbox page and tests. */
export function firstLink(text: string): string | null {
  return /https?:\/\/\S+/.exec(text)?.[0] ?? null;
}
