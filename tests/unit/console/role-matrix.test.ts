// Pins the role matrix the README documents (issue: admin everything; engineer profiles, verdicts, own keys;
// auditor read, replay, export, no profile or key changes; developer API reference, sandbox keys, own call log).
import { describe, expect, it } from "vitest";
import { PERMISSION_LABELS } from "@/components/console/members/role-matrix";
import { can, PERMISSIONS, type Permission } from "@/lib/auth/roles";

describe("role matrix", () => {
  it("admin holds every permission", () => {
    for (const p of Object.keys(PERMISSIONS) as Permission[]) expect(can("admin", p)).toBe(true);
  });

  it("auditor cannot change profiles or keys, and can read, replay and export", () => {
    for (const p of ["profiles:edit", "keys:manage-own", "keys:manage-all", "keys:create-live", "members:manage"] as const) expect(can("auditor", p)).toBe(false);
    for (const p of ["verdicts:read", "verdicts:replay", "audit:export", "calllog:read-all"] as const) expect(can("auditor", p)).toBe(true);
  });

  it("developer gets sandbox keys and their own call log only", () => {
    expect(can("developer", "keys:manage-own")).toBe(true);
    expect(can("developer", "keys:create-live")).toBe(false);
    expect(can("developer", "calllog:read-own")).toBe(true);
    expect(can("developer", "calllog:read-all")).toBe(false);
    expect(can("developer", "apidocs:try")).toBe(true);
  });

  it("engineer edits profiles and manages only their own keys", () => {
    expect(can("engineer", "profiles:edit")).toBe(true);
    expect(can("engineer", "keys:manage-own")).toBe(true);
    expect(can("engineer", "keys:manage-all")).toBe(false);
    expect(can("engineer", "members:manage")).toBe(false);
  });

  it("every permission has a plain-language label for the console's table", () => {
    expect(Object.keys(PERMISSION_LABELS).sort()).toEqual(Object.keys(PERMISSIONS).sort());
  });
});
