import { createHash, randomBytes, timingSafeEqual } from "node:crypto";

// Key format: gg_<env>_<base62 of 32 random bytes>. The prefix makes leaked keys greppable by secret
// scanners and tells sandbox from live at a glance; 256 bits of entropy make guessing pointless, so a fast
// SHA-256 (not a password hash) is enough for storage and lets verification be one indexed lookup.

export type KeyEnvironment = "live" | "sandbox";

export const KEY_PREFIX: Record<KeyEnvironment, string> = { live: "gg_live_", sandbox: "gg_sbx_" };
const ALPHABET = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz";
export const KEY_PATTERN = /^gg_(live|sbx)_[0-9A-Za-z]{40,48}$/;

function base62(bytes: Uint8Array): string {
  let n = BigInt("0x" + Buffer.from(bytes).toString("hex"));
  let out = "";
  while (n > 0n) {
    out = ALPHABET[Number(n % 62n)] + out;
    n /= 62n;
  }
  // 32 bytes need up to 43 base62 digits; pad so every key has the same length.
  return out.padStart(43, "0");
}

export function hashApiKey(secret: string): string {
  return createHash("sha256").update(secret, "utf8").digest("hex");
}

export interface NewApiKey {
  secret: string;
  start: string;
  hash: string;
  environment: KeyEnvironment;
}

export function generateApiKey(environment: KeyEnvironment, entropy: Uint8Array = randomBytes(32)): NewApiKey {
  const secret = KEY_PREFIX[environment] + base62(entropy);
  return { secret, start: displayStart(secret), hash: hashApiKey(secret), environment };
}

/** What the console may show of a key forever: its prefix and the first four random characters. */
export function displayStart(secret: string): string {
  const m = /^(gg_(?:live|sbx)_)(.{4})/.exec(secret);
  return m ? `${m[1]}${m[2]}…` : "…";
}

export function environmentOf(secret: string): KeyEnvironment | null {
  if (secret.startsWith(KEY_PREFIX.live)) return "live";
  if (secret.startsWith(KEY_PREFIX.sandbox)) return "sandbox";
  return null;
}

export function isWellFormedKey(secret: string): boolean {
  return KEY_PATTERN.test(secret);
}

export function hashesEqual(a: string, b: string): boolean {
  const x = Buffer.from(a, "hex");
  const y = Buffer.from(b, "hex");
  return x.length === y.length && timingSafeEqual(x, y);
}

export const API_SCOPES = ["grade", "verdicts:read", "profiles:read"] as const;
export type ApiScope = (typeof API_SCOPES)[number];
