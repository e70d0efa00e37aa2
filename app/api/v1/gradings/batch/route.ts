// POST /api/v1/gradings/batch: up to 1,000 tests; valid ones are graded and stored together, invalid ones
// come back with their own field errors. Graded items carry a verdict summary (reason codes, not texts)
// so a 1,000-item answer stays a few hundred kilobytes; GET /api/v1/verdicts/{id} has the full verdict.
import { profileForRequest } from "@/lib/api/profile-for-request";
import { fieldErrorsFromIssues } from "@/lib/api/problem";
import { json } from "@/lib/api/respond";
import { BatchEnvelopeSchema, BatchResultSchema, type BatchResult } from "@/lib/api/schemas/gradings";
import { withApiKey } from "@/lib/api/with-api-key";
import { LinkTestSchema, type LinkTest } from "@/lib/grading/schema";
import { gradeAndStore } from "@/lib/verdicts/grade";
import { toVerdictSummary } from "@/lib/verdicts/present";
import { refuseOtherMethods } from "@/lib/api/other-methods";

export const dynamic = "force-dynamic";

export const POST = withApiKey(
  async (ctx) => {
    const envelope = ctx.body(BatchEnvelopeSchema);
    const profile = await profileForRequest(ctx.db, ctx.organisationId, envelope.profile, ctx.key.defaultProfile);
    const items: BatchResult["items"] = new Array(envelope.tests.length);
    const valid: { index: number; test: LinkTest }[] = [];
    envelope.tests.forEach((raw, index) => {
      const r = LinkTestSchema.safeParse(raw);
      if (r.success) valid.push({ index, test: r.data });
      else items[index] = { index, status: "invalid", errors: fieldErrorsFromIssues(r.error.issues, ["tests", index]) };
    });
    const rows = await gradeAndStore({ db: ctx.db, organisationId: ctx.organisationId, apiKeyId: ctx.key.id, now: ctx.now }, profile, valid);
    const counts = { pass: 0, marginal: 0, fail: 0 };
    rows.forEach((row, i) => {
      counts[row.verdict] += 1;
      items[valid[i].index] = { index: valid[i].index, status: "graded", verdict: toVerdictSummary(row) };
    });
    // 201 when something was stored; 200 with every item invalid (nothing was created).
    return json(BatchResultSchema, { graded: rows.length, invalid: items.length - rows.length, counts, items }, { status: rows.length ? 201 : 200 });
  },
  { route: "/api/v1/gradings/batch", scope: "grade", maxBodyBytes: 16 * 1024 * 1024 },
);

export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods("/api/v1/gradings/batch", ["POST"]);
