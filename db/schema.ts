import { sql } from "drizzle-orm";
import {
  bigint,
  bigserial,
  boolean,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  primaryKey,
  real,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";

// Every tenant table carries organisation_id so the data can later be sharded by it without redesign.

const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();

export const roleEnum = pgEnum("member_role", ["admin", "engineer", "auditor", "developer"]);
export const keyEnvironmentEnum = pgEnum("key_environment", ["live", "sandbox"]);
export const verdictEnum = pgEnum("verdict_value", ["pass", "marginal", "fail"]);

export const organisations = pgTable("organisations", {
  id: uuid("id").primaryKey().defaultRandom(),
  slug: text("slug").notNull().unique(),
  name: text("name").notNull(),
  // "slug" or "slug@version" of a template or of one of the organisation's profiles.
  defaultProfile: text("default_profile").notNull().default("tia-568-3-d-singlemode-osp"),
  retentionDays: integer("retention_days").notNull().default(2555),
  createdAt: createdAt(),
});

export const users = pgTable("users", {
  id: uuid("id").primaryKey().defaultRandom(),
  email: text("email").notNull(),
  name: text("name").notNull(),
  passwordHash: text("password_hash"),
  createdAt: createdAt(),
}, (t) => [uniqueIndex("users_email_lower_idx").on(sql`lower(${t.email})`)]);

export const memberships = pgTable("memberships", {
  organisationId: uuid("organisation_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
  userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  role: roleEnum("role").notNull(),
  createdAt: createdAt(),
}, (t) => [primaryKey({ columns: [t.organisationId, t.userId] }), index("memberships_user_idx").on(t.userId)]);

export const apiKeys = pgTable("api_keys", {
  id: uuid("id").primaryKey().defaultRandom(),
  organisationId: uuid("organisation_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
  name: text("name").notNull(),
  environment: keyEnvironmentEnum("environment").notNull(),
  // Display fragment only (prefix + first characters); the secret itself is never stored.
  start: text("start").notNull(),
  hash: text("hash").notNull().unique(),
  scopes: text("scopes").array().notNull(),
  createdByUserId: uuid("created_by_user_id").references(() => users.id, { onDelete: "set null" }),
  expiresAt: timestamp("expires_at", { withTimezone: true }),
  revokedAt: timestamp("revoked_at", { withTimezone: true }),
  lastUsedAt: timestamp("last_used_at", { withTimezone: true }),
  rateLimitPerMinute: integer("rate_limit_per_minute").notNull().default(600),
  createdAt: createdAt(),
}, (t) => [index("api_keys_org_idx").on(t.organisationId)]);

export const profiles = pgTable("profiles", {
  id: uuid("id").primaryKey().defaultRandom(),
  organisationId: uuid("organisation_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
  slug: text("slug").notNull(),
  name: text("name").notNull(),
  basedOn: text("based_on"),
  // The editable draft; null when there is no open draft.
  draft: jsonb("draft"),
  draftUpdatedAt: timestamp("draft_updated_at", { withTimezone: true }),
  createdAt: createdAt(),
}, (t) => [uniqueIndex("profiles_org_slug_idx").on(t.organisationId, t.slug)]);

// Published versions are immutable: a database trigger (see migrations) refuses UPDATE.
export const profileVersions = pgTable("profile_versions", {
  id: uuid("id").primaryKey().defaultRandom(),
  organisationId: uuid("organisation_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
  profileId: uuid("profile_id").notNull().references(() => profiles.id, { onDelete: "cascade" }),
  version: integer("version").notNull(),
  limits: jsonb("limits").notNull(),
  note: text("note").notNull().default(""),
  publishedByUserId: uuid("published_by_user_id").references(() => users.id, { onDelete: "set null" }),
  publishedAt: timestamp("published_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [uniqueIndex("profile_versions_profile_version_idx").on(t.profileId, t.version)]);

export const tests = pgTable("tests", {
  id: uuid("id").primaryKey().defaultRandom(),
  organisationId: uuid("organisation_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
  linkRef: text("link_ref").notNull(),
  input: jsonb("input").notNull(),
  createdAt: createdAt(),
}, (t) => [index("tests_org_created_idx").on(t.organisationId, t.createdAt)]);

export const verdicts = pgTable("verdicts", {
  id: uuid("id").primaryKey().defaultRandom(),
  organisationId: uuid("organisation_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
  // Position in the organisation's audit chain; also the stable cursor for pagination.
  seq: bigint("seq", { mode: "number" }).notNull(),
  testId: uuid("test_id").notNull().references(() => tests.id, { onDelete: "cascade" }),
  linkRef: text("link_ref").notNull(),
  verdict: verdictEnum("verdict").notNull(),
  headroomDb: real("headroom_db"),
  profileSlug: text("profile_slug").notNull(),
  profileVersion: integer("profile_version").notNull(),
  engineVersion: text("engine_version").notNull(),
  reasonCodes: text("reason_codes").array().notNull().default(sql`'{}'::text[]`),
  result: jsonb("result").notNull(),
  digest: text("digest").notNull(),
  prevDigest: text("prev_digest"),
  apiKeyId: uuid("api_key_id").references(() => apiKeys.id, { onDelete: "set null" }),
  userId: uuid("user_id").references(() => users.id, { onDelete: "set null" }),
  createdAt: createdAt(),
}, (t) => [
  uniqueIndex("verdicts_org_seq_idx").on(t.organisationId, t.seq),
  index("verdicts_org_created_idx").on(t.organisationId, t.createdAt),
  index("verdicts_org_link_idx").on(t.organisationId, t.linkRef),
]);

// A compact copy of each stored test's graded input beside its verdict, in chain order: impact previews
// re-grade hundreds of thousands of tests and read only this narrow table instead of joining every
// verdict to its jsonb test. Filled by a trigger on verdicts (migration 0005), so every write path keeps
// it complete; the format is written by glassgrade_pack_test_input() and read by
// lib/verdicts/packed-input.ts. The tests table stays the record; this is derived from it.
export const previewInputs = pgTable("preview_inputs", {
  organisationId: uuid("organisation_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
  seq: bigint("seq", { mode: "number" }).notNull(),
  verdictId: uuid("verdict_id").notNull().references(() => verdicts.id, { onDelete: "cascade" }),
  verdict: verdictEnum("verdict").notNull(),
  headroomDb: real("headroom_db"),
  profileSlug: text("profile_slug").notNull(),
  profileVersion: integer("profile_version").notNull(),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull(),
  packed: text("packed").notNull(),
}, (t) => [primaryKey({ columns: [t.organisationId, t.seq] })]);

// Head of each organisation's verdict chain: appends update this one row (its row lock serialises them)
// and insert their verdicts in the same statement, so storing a grading is a single round trip.
export const verdictChainHeads = pgTable("verdict_chain_heads", {
  organisationId: uuid("organisation_id").primaryKey().references(() => organisations.id, { onDelete: "cascade" }),
  seq: bigint("seq", { mode: "number" }).notNull(),
  digest: text("digest").notNull(),
  // The head's digest before the latest append: the prev_digest of that append's first verdict.
  prevDigest: text("prev_digest"),
});

export const callLog = pgTable("call_log", {
  id: bigserial("id", { mode: "number" }).primaryKey(),
  organisationId: uuid("organisation_id").references(() => organisations.id, { onDelete: "cascade" }),
  apiKeyId: uuid("api_key_id").references(() => apiKeys.id, { onDelete: "set null" }),
  userId: uuid("user_id").references(() => users.id, { onDelete: "set null" }),
  method: text("method").notNull(),
  route: text("route").notNull(),
  path: text("path").notNull(),
  status: integer("status").notNull(),
  latencyMs: real("latency_ms").notNull(),
  requestId: text("request_id").notNull(),
  verdictId: uuid("verdict_id"),
  problemType: text("problem_type"),
  createdAt: createdAt(),
}, (t) => [
  index("call_log_org_created_idx").on(t.organisationId, t.createdAt),
  index("call_log_key_created_idx").on(t.apiKeyId, t.createdAt),
]);

export const idempotencyKeys = pgTable("idempotency_keys", {
  apiKeyId: uuid("api_key_id").notNull().references(() => apiKeys.id, { onDelete: "cascade" }),
  key: text("key").notNull(),
  organisationId: uuid("organisation_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
  route: text("route").notNull(),
  requestHash: text("request_hash").notNull(),
  completed: boolean("completed").notNull().default(false),
  responseStatus: integer("response_status"),
  responseHeaders: jsonb("response_headers"),
  responseBody: text("response_body"),
  createdAt: createdAt(),
}, (t) => [primaryKey({ columns: [t.apiKeyId, t.key] })]);

export const invitations = pgTable("invitations", {
  id: uuid("id").primaryKey().defaultRandom(),
  organisationId: uuid("organisation_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
  email: text("email").notNull(),
  role: roleEnum("role").notNull(),
  tokenHash: text("token_hash").notNull().unique(),
  invitedByUserId: uuid("invited_by_user_id").references(() => users.id, { onDelete: "set null" }),
  expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  acceptedAt: timestamp("accepted_at", { withTimezone: true }),
  revokedAt: timestamp("revoked_at", { withTimezone: true }),
  createdAt: createdAt(),
});

export const passwordResets = pgTable("password_resets", {
  id: uuid("id").primaryKey().defaultRandom(),
  userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  tokenHash: text("token_hash").notNull().unique(),
  expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  usedAt: timestamp("used_at", { withTimezone: true }),
  createdAt: createdAt(),
});

// What the development SMTP receiver caught; shown on the console's mailbox page. Never used in production.
export const devMailbox = pgTable("dev_mailbox", {
  id: bigserial("id", { mode: "number" }).primaryKey(),
  from: text("from_address").notNull(),
  to: text("to_address").notNull(),
  subject: text("subject").notNull(),
  body: text("body").notNull(),
  receivedAt: timestamp("received_at", { withTimezone: true }).notNull().defaultNow(),
});

// Audit trail of console changes; no foreign keys so history outlives the rows it describes.
export const auditEvents = pgTable("audit_events", {
  id: bigserial("id", { mode: "number" }).primaryKey(),
  organisationId: uuid("organisation_id").notNull(),
  actorUserId: uuid("actor_user_id"),
  actorApiKeyId: uuid("actor_api_key_id"),
  action: text("action").notNull(),
  entity: text("entity").notNull(),
  entityId: text("entity_id").notNull(),
  before: jsonb("before"),
  after: jsonb("after"),
  requestId: text("request_id"),
  createdAt: createdAt(),
}, (t) => [index("audit_events_org_created_idx").on(t.organisationId, t.createdAt)]);

export type Organisation = typeof organisations.$inferSelect;
export type User = typeof users.$inferSelect;
export type Membership = typeof memberships.$inferSelect;
export type Role = (typeof roleEnum.enumValues)[number];
export type ApiKey = typeof apiKeys.$inferSelect;
export type Profile = typeof profiles.$inferSelect;
export type ProfileVersion = typeof profileVersions.$inferSelect;
export type StoredTest = typeof tests.$inferSelect;
export type StoredVerdict = typeof verdicts.$inferSelect;
export type CallLogRow = typeof callLog.$inferSelect;
