// Slows password guessing: after MAX_FAILURES failed sign-ins for one e-mail address within WINDOW_MS,
// further attempts for it are refused until the window has passed. Kept in process memory: enough for one
// instance; several instances behind a balancer would move this to PostgreSQL.
export const MAX_FAILURES = 10;
export const WINDOW_MS = 15 * 60 * 1000;

export class AttemptLimiter {
  private failures = new Map<string, number[]>();

  constructor(private readonly max = MAX_FAILURES, private readonly windowMs = WINDOW_MS) {}

  private recent(key: string, now: number): number[] {
    const list = (this.failures.get(key) ?? []).filter((t) => now - t < this.windowMs);
    if (list.length) this.failures.set(key, list);
    else this.failures.delete(key);
    return list;
  }

  isBlocked(key: string, now = Date.now()): boolean {
    return this.recent(key, now).length >= this.max;
  }

  fail(key: string, now = Date.now()): void {
    this.failures.set(key, [...this.recent(key, now), now]);
  }

  succeed(key: string): void {
    this.failures.delete(key);
  }
}

const globalForLimiter = globalThis as unknown as { glassgradeSignInLimiter?: AttemptLimiter };
export const signInLimiter = (globalForLimiter.glassgradeSignInLimiter ??= new AttemptLimiter());
