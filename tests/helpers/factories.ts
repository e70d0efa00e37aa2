// Small builders for test data: each suite makes its own organisation so suites never share state.
import { randomUUID } from "node:crypto";
import { getDb } from "@/db";
import { apiKeys, memberships, organisations, users, type Role } from "@/db/schema";
import { API_SCOPES, generateApiKey, type ApiScope, type KeyEnvironment } from "@/lib/keys/api-key";

export interface TestOrganisation {
  id: string;
  slug: string;
  name: string;
  defaultProfile: string;
}

function suffix(): string {
  return randomUUID().slice(0, 8);
}

export async function createOrganisation(
  opts: { slug?: string; name?: string; defaultProfile?: string } = {},
): Promise<TestOrganisation> {
  const slug = opts.slug ?? `org-${suffix()}`;
  const [row] = await getDb()
    .insert(organisations)
    .values({
      slug,
      name: opts.name ?? `Test organisation ${slug}`,
      ...(opts.defaultProfile ? { defaultProfile: opts.defaultProfile } : {}),
    })
    .returning();
  return { id: row.id, slug: row.slug, name: row.name, defaultProfile: row.defaultProfile };
}

export interface TestUser {
  id: string;
  email: string;
  name: string;
  role: Role;
}

export async function createUser(
  org: { id: string },
  role: Role,
  opts: { email?: string; name?: string; passwordHash?: string | null } = {},
): Promise<TestUser> {
  const email = opts.email ?? `${role}-${suffix()}@test.example`;
  const [u] = await getDb()
    .insert(users)
    .values({ email, name: opts.name ?? `Test ${role}`, passwordHash: opts.passwordHash ?? null })
    .returning();
  await getDb().insert(memberships).values({ organisationId: org.id, userId: u.id, role });
  return { id: u.id, email: u.email, name: u.name, role };
}

export interface TestApiKey {
  id: string;
  /** The plaintext key, as a client would send it. */
  secret: string;
  organisationId: string;
  environment: KeyEnvironment;
  scopes: string[];
}

export async function createApiKey(
  org: { id: string },
  opts: {
    scopes?: readonly ApiScope[] | string[];
    environment?: KeyEnvironment;
    expiresAt?: Date | null;
    revoked?: boolean;
    rateLimitPerMinute?: number;
    name?: string;
    createdByUserId?: string | null;
  } = {},
): Promise<TestApiKey> {
  const environment = opts.environment ?? "sandbox";
  const k = generateApiKey(environment);
  const scopes = [...(opts.scopes ?? API_SCOPES)];
  const [row] = await getDb()
    .insert(apiKeys)
    .values({
      organisationId: org.id,
      name: opts.name ?? `test key ${suffix()}`,
      environment,
      start: k.start,
      hash: k.hash,
      scopes,
      expiresAt: opts.expiresAt ?? null,
      revokedAt: opts.revoked ? new Date() : null,
      createdByUserId: opts.createdByUserId ?? null,
      ...(opts.rateLimitPerMinute ? { rateLimitPerMinute: opts.rateLimitPerMinute } : {}),
    })
    .returning({ id: apiKeys.id });
  return { id: row.id, secret: k.secret, organisationId: org.id, environment, scopes };
}
