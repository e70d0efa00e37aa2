// Per-key token bucket held in this process. One instance serves a regional operator; with several
// instances behind a load balancer each enforces its own share, and the shared plan (docs/api.md) moves
// the bucket into PostgreSQL or a shared store keyed the same way.

export interface RateDecision {
  allowed: boolean;
  limit: number;
  remaining: number;
  /** Seconds until the bucket is full again (RateLimit-Reset). */
  resetSeconds: number;
  /** Seconds until one more request is allowed (Retry-After); 0 when allowed. */
  retryAfterSeconds: number;
}

interface Bucket {
  tokens: number;
  updatedMs: number;
}

export class TokenBucketLimiter {
  private buckets = new Map<string, Bucket>();

  constructor(private readonly windowMs = 60_000, private readonly maxBuckets = 50_000) {}

  take(id: string, perWindow: number, nowMs: number): RateDecision {
    const ratePerMs = perWindow / this.windowMs;
    let b = this.buckets.get(id);
    if (!b) {
      if (this.buckets.size >= this.maxBuckets) this.evictFull(nowMs, ratePerMs);
      b = { tokens: perWindow, updatedMs: nowMs };
      this.buckets.set(id, b);
    }
    b.tokens = Math.min(perWindow, b.tokens + (nowMs - b.updatedMs) * ratePerMs);
    b.updatedMs = nowMs;
    const allowed = b.tokens >= 1;
    if (allowed) b.tokens -= 1;
    const missing = perWindow - b.tokens;
    return {
      allowed,
      limit: perWindow,
      remaining: Math.floor(b.tokens),
      resetSeconds: Math.ceil(missing / ratePerMs / 1000),
      retryAfterSeconds: allowed ? 0 : Math.max(1, Math.ceil((1 - b.tokens) / ratePerMs / 1000)),
    };
  }

  // Buckets that have refilled completely carry no state worth keeping.
  private evictFull(nowMs: number, ratePerMs: number) {
    for (const [id, b] of this.buckets) {
      if (b.tokens + (nowMs - b.updatedMs) * ratePerMs >= this.windowMs * ratePerMs) this.buckets.delete(id);
    }
    if (this.buckets.size >= this.maxBuckets) this.buckets.clear();
  }

  reset() {
    this.buckets.clear();
  }
}

export function rateLimitHeaders(d: RateDecision, windowSeconds = 60): Record<string, string> {
  const h: Record<string, string> = {
    "RateLimit-Policy": `${d.limit};w=${windowSeconds}`,
    "RateLimit-Limit": String(d.limit),
    "RateLimit-Remaining": String(d.remaining),
    "RateLimit-Reset": String(d.resetSeconds),
  };
  if (!d.allowed) h["Retry-After"] = String(d.retryAfterSeconds);
  return h;
}
