// lib/grading must stay pure: no database, app or framework imports, no Node built-ins (it is also
// bundled for the browser), no clock and no randomness. A structural check so a later edit cannot
// slip one in unnoticed.
import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const ROOT = path.resolve(import.meta.dirname, "../../../lib/grading");

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? sources(full) : full.endsWith(".ts") ? [full] : [];
  });
}

describe("lib/grading purity", () => {
  const files = sources(ROOT);

  it("finds the engine's files", () => {
    expect(files.length).toBeGreaterThan(10);
  });

  it("imports only its own modules and zod", () => {
    for (const f of files) {
      const specifiers = [...readFileSync(f, "utf8").matchAll(/^\s*(?:import|export)[^'"]*from\s+["']([^"']+)["']/gm)].map((m) => m[1]);
      for (const s of specifiers) expect(s.startsWith(".") || s === "zod", `${path.relative(ROOT, f)} imports ${s}`).toBe(true);
    }
  });

  it("reads no clock, no randomness, no environment", () => {
    for (const f of files) {
      const code = readFileSync(f, "utf8").replace(/\/\/.*$/gm, "");
      for (const banned of ["Date.now", "new Date", "Math.random", "process.", "performance.now", "require("]) {
        expect(code.includes(banned), `${path.relative(ROOT, f)} uses ${banned}`).toBe(false);
      }
    }
  });
});
