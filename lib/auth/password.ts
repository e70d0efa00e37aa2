import bcrypt from "bcryptjs";

// bcrypt cost 12: about a quarter of a second per hash here, slow enough for stolen hashes, quick for a person.
export const PASSWORD_COST = 12;

export { passwordSchema } from "./password-schema";

export function hashPassword(plain: string): Promise<string> {
  return bcrypt.hash(plain, PASSWORD_COST);
}

let decoy: Promise<string> | undefined;

export async function verifyPassword(plain: string, hash: string | null | undefined): Promise<boolean> {
  // Compare against a decoy hash when the user has none, so timing does not reveal which e-mails exist.
  if (!hash) {
    decoy ??= bcrypt.hash("no-such-user-decoy", PASSWORD_COST);
    await bcrypt.compare(plain, await decoy);
    return false;
  }
  return bcrypt.compare(plain, hash);
}
