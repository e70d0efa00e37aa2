import { describe, expect, it } from "vitest";
import { AttemptLimiter } from "@/lib/auth/attempts";

describe("sign-in attempt limiter", () => {
  it("blocks an address after the allowed failures and releases it when the window has passed", () => {
    const l = new AttemptLimiter(3, 1000);
    for (let i = 0; i < 2; i++) l.fail("a@x", 100 + i);
    expect(l.isBlocked("a@x", 200)).toBe(false);
    l.fail("a@x", 300);
    expect(l.isBlocked("a@x", 301)).toBe(true);
    expect(l.isBlocked("b@x", 301)).toBe(false);
    // The first two failures age out of the window.
    expect(l.isBlocked("a@x", 1101)).toBe(false);
  });

  it("a successful sign-in clears the count", () => {
    const l = new AttemptLimiter(2, 1000);
    l.fail("a@x", 1);
    l.succeed("a@x");
    l.fail("a@x", 2);
    expect(l.isBlocked("a@x", 3)).toBe(false);
  });
});
