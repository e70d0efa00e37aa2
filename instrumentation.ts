// Runs once when the Next.js server starts (not during `next build`): applies the call-log retention and
// drops Idempotency-Key records past their 24-hour replay window, now and every six hours. One instance is
// enough to do it; several instances doing it is harmless.
const SIX_HOURS_MS = 6 * 60 * 60 * 1000;

export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { getDb } = await import("./db");
  const { purgeExpiredCallLog } = await import("./lib/retention/call-log");
  const { purgeIdempotencyKeys } = await import("./db/queries/idempotency");
  const { IDEMPOTENCY_TTL_MS } = await import("./lib/api/idempotency");
  const purge = async () => {
    try {
      const now = new Date();
      const removed = await purgeExpiredCallLog(getDb(), now);
      if (removed > 0) console.log(`[retention] removed ${removed} expired call-log rows`);
      await purgeIdempotencyKeys(getDb(), new Date(now.getTime() - IDEMPOTENCY_TTL_MS));
    } catch (err) {
      // The database may not be up yet; the next round tries again.
      console.error("[retention] purge failed:", err instanceof Error ? err.message : err);
    }
  };
  void purge();
  setInterval(purge, SIX_HOURS_MS).unref();
}
