// Key management against the real database and the API's own key check (lib/keys/verify.ts).
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { apiKeys, auditEvents } from "@/db/schema";
import { hashApiKey } from "@/lib/keys/api-key";
import { createKey, listKeys, revokeKey } from "@/lib/keys/manage";
import { verifyApiKey } from "@/lib/keys/verify";
import { orgWithEveryRole } from "./support";

describe("API key management", () => {
  it("returns the secret once, stores only its hash, and the key passes the API's check", async () => {
    const { members } = await orgWithEveryRole();
    const created = await createKey({ actor: members.engineer }, { name: "Activation system", environment: "live", scopes: ["grade", "verdicts:read"] });
    expect(created.secret).toMatch(/^gg_live_[0-9A-Za-z]{43}$/);
    expect(created.start).toBe(created.secret.slice(0, 12) + "…");

    const [row] = await getDb().select().from(apiKeys).where(eq(apiKeys.id, created.id));
    expect(row.hash).toBe(hashApiKey(created.secret));
    expect(JSON.stringify(row)).not.toContain(created.secret);

    const listed = await listKeys({ actor: members.engineer });
    expect(listed).toHaveLength(1);
    expect(JSON.stringify(listed)).not.toContain(created.secret);
    expect(JSON.stringify(listed)).not.toContain(row.hash);
    expect(listed[0]).not.toHaveProperty("secret");

    const ok = await verifyApiKey(getDb(), `Bearer ${created.secret}`, "grade", new Date());
    expect(ok.ok).toBe(true);
    const noScope = await verifyApiKey(getDb(), `Bearer ${created.secret}`, "profiles:read", new Date());
    expect(noScope).toMatchObject({ ok: false, code: "forbidden" });

    await revokeKey({ actor: members.engineer }, { keyId: created.id });
    const refused = await verifyApiKey(getDb(), `Bearer ${created.secret}`, "grade", new Date());
    expect(refused).toMatchObject({ ok: false, code: "unauthorized" });

    const trail = await getDb().select().from(auditEvents).where(eq(auditEvents.entityId, created.id));
    expect(trail.map((e) => e.action).sort()).toEqual(["api_key.created", "api_key.revoked"]);
  });

  it("an expiry date ends the key at the end of that UTC day", async () => {
    const { members } = await orgWithEveryRole();
    const tomorrow = new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);
    const k = await createKey({ actor: members.developer }, { name: "Short-lived", environment: "sandbox", scopes: ["grade"], expiresOn: tomorrow });
    expect(k.expiresAt).toBe(`${tomorrow}T23:59:59.999Z`);
    const before = await verifyApiKey(getDb(), `Bearer ${k.secret}`, "grade", new Date(`${tomorrow}T23:59:59.000Z`));
    const after = await verifyApiKey(getDb(), `Bearer ${k.secret}`, "grade", new Date(`${tomorrow}T23:59:59.999Z`));
    expect(before.ok).toBe(true);
    expect(after.ok).toBe(false);
  });

  it("rejects bad input with the schema's messages and creates nothing", async () => {
    const { org, members } = await orgWithEveryRole();
    await expect(createKey({ actor: members.admin }, { name: " ", environment: "sandbox", scopes: ["grade"] })).rejects.toMatchObject({ name: "ZodError" });
    await expect(createKey({ actor: members.admin }, { name: "x", environment: "sandbox", scopes: [] })).rejects.toMatchObject({ name: "ZodError" });
    await expect(createKey({ actor: members.admin }, { name: "x", environment: "sandbox", scopes: ["admin:everything"] })).rejects.toMatchObject({ name: "ZodError" });
    await expect(createKey({ actor: members.admin }, { name: "x", environment: "sandbox", scopes: ["grade"], expiresOn: "2001-01-01" })).rejects.toMatchObject({ name: "ZodError" });
    const rows = await getDb().select().from(apiKeys).where(eq(apiKeys.organisationId, org.id));
    expect(rows).toHaveLength(0);
  });

  it("admins list every key of their organisation, others only their own, nobody another organisation's", async () => {
    const a = await orgWithEveryRole();
    const b = await orgWithEveryRole();
    const eng = await createKey({ actor: a.members.engineer }, { name: "eng", environment: "sandbox", scopes: ["grade"] });
    const dev = await createKey({ actor: a.members.developer }, { name: "dev", environment: "sandbox", scopes: ["grade"] });
    await createKey({ actor: b.members.admin }, { name: "other org", environment: "sandbox", scopes: ["grade"] });
    expect((await listKeys({ actor: a.members.admin })).map((k) => k.id).sort()).toEqual([eng.id, dev.id].sort());
    expect((await listKeys({ actor: a.members.engineer })).map((k) => k.id)).toEqual([eng.id]);
    expect((await listKeys({ actor: a.members.developer })).map((k) => k.id)).toEqual([dev.id]);
    await expect(revokeKey({ actor: b.members.admin }, { keyId: eng.id })).rejects.toMatchObject({ name: "NotFoundError" });
  });
});
