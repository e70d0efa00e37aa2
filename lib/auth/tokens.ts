import { createHash, randomBytes } from "node:crypto";

// One-time tokens for invitations and password resets: 32 random bytes in the link, only a SHA-256 of
// them in the database, so a read of the table cannot be turned into working links.
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}
