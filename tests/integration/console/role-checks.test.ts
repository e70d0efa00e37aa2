// Every console operation checks the role on the server: each role, allowed and denied, against the real
// database. The expected matrix is written out here on purpose (not derived from lib/auth/roles.ts), so a
// change to the permission table has to be made twice and cannot slip through unnoticed.
import { describe, expect, it, beforeAll } from "vitest";
import type { Role } from "@/db/schema";
import type { Member } from "@/lib/auth/context";
import { ForbiddenError } from "@/lib/auth/errors";
import { callLogFacets, listCalls } from "@/lib/calllog/query";
import { createKey, listKeys, revokeKey } from "@/lib/keys/manage";
import { changeMemberRole, listMembers, listPendingInvitations, removeMember } from "@/lib/members/members";
import { inviteMember, revokeInvitation } from "@/lib/members/invitations";
import { getOverview } from "@/lib/overview/queries";
import { getRetention, setRetention } from "@/lib/retention/call-log";
import { createUser } from "../../helpers/factories";
import { ALL_ROLES, memberOf, orgWithEveryRole } from "./support";

type Op = (m: Member, ctx: { org: Awaited<ReturnType<typeof orgWithEveryRole>>["org"] }) => Promise<unknown>;

const OPS: Record<string, { allowed: Role[]; run: Op }> = {
  "list members": { allowed: ["admin"], run: (m) => listMembers({ actor: m }) },
  "list invitations": { allowed: ["admin"], run: (m) => listPendingInvitations({ actor: m }) },
  "invite a member": { allowed: ["admin"], run: (m) => inviteMember({ actor: m }, { email: `new-${crypto.randomUUID().slice(0, 6)}@test.example`, role: "developer" }) },
  "change a role": {
    allowed: ["admin"],
    run: async (m, { org }) => {
      const u = await createUser(org, "developer");
      return changeMemberRole({ actor: m }, { userId: u.id, role: "engineer" });
    },
  },
  "remove a member": {
    allowed: ["admin"],
    run: async (m, { org }) => {
      const u = await createUser(org, "developer");
      return removeMember({ actor: m }, { userId: u.id });
    },
  },
  "read retention": { allowed: ["admin"], run: (m) => getRetention({ actor: m }) },
  "set retention": { allowed: ["admin"], run: (m) => setRetention({ actor: m }, { callLogDays: 400 }) },
  "list keys": { allowed: ["admin", "engineer", "developer"], run: (m) => listKeys({ actor: m }) },
  "create a sandbox key": { allowed: ["admin", "engineer", "developer"], run: (m) => createKey({ actor: m }, { name: "sbx", environment: "sandbox", scopes: ["grade"] }) },
  "create a live key": { allowed: ["admin", "engineer"], run: (m) => createKey({ actor: m }, { name: "live", environment: "live", scopes: ["grade"] }) },
  "read the call log": { allowed: ["admin", "engineer", "auditor", "developer"], run: (m) => listCalls({ actor: m }, {}) },
  "read call-log facets": { allowed: ["admin", "engineer", "auditor", "developer"], run: (m) => callLogFacets({ actor: m }) },
  "read the overview": { allowed: ["admin", "engineer", "auditor", "developer"], run: (m) => getOverview({ actor: m }) },
};

describe("console role checks", () => {
  let env: Awaited<ReturnType<typeof orgWithEveryRole>>;
  beforeAll(async () => {
    env = await orgWithEveryRole();
  });

  for (const [name, op] of Object.entries(OPS)) {
    for (const role of ALL_ROLES) {
      const allowed = op.allowed.includes(role);
      it(`${role} ${allowed ? "may" : "may not"} ${name}`, async () => {
        const run = op.run(env.members[role], { org: env.org });
        const outcome = await run.then(() => "done", (err: unknown) => err);
        if (allowed) expect(outcome).toBe("done");
        else expect(outcome).toBeInstanceOf(ForbiddenError);
      });
    }
  }

  it("revoking: admin revokes anyone's key, others only their own, auditor none", async () => {
    const { members } = env;
    const engineersKey = await createKey({ actor: members.engineer }, { name: "eng", environment: "sandbox", scopes: ["grade"] });
    // The developer cannot see or revoke the engineer's key: it looks like a missing one.
    await expect(revokeKey({ actor: members.developer }, { keyId: engineersKey.id })).rejects.toMatchObject({ name: "NotFoundError" });
    await expect(revokeKey({ actor: members.auditor }, { keyId: engineersKey.id })).rejects.toBeInstanceOf(ForbiddenError);
    await expect(revokeKey({ actor: members.admin }, { keyId: engineersKey.id })).resolves.toMatchObject({ status: "revoked" });
    const devKey = await createKey({ actor: members.developer }, { name: "dev", environment: "sandbox", scopes: ["grade"] });
    await expect(revokeKey({ actor: members.developer }, { keyId: devKey.id })).resolves.toMatchObject({ status: "revoked" });
  });

  it("an invitation can only be revoked by an admin of the same organisation", async () => {
    const sent = await inviteMember({ actor: env.members.admin }, { email: "revoke-me@test.example", role: "auditor" });
    await expect(revokeInvitation({ actor: env.members.engineer }, { invitationId: sent.invitationId })).rejects.toBeInstanceOf(ForbiddenError);
    const other = await orgWithEveryRole();
    await expect(revokeInvitation({ actor: other.members.admin }, { invitationId: sent.invitationId })).rejects.toMatchObject({ name: "NotFoundError" });
    await expect(revokeInvitation({ actor: env.members.admin }, { invitationId: sent.invitationId })).resolves.toBeUndefined();
  });

  it("an admin of another organisation cannot change or remove our members", async () => {
    const other = await orgWithEveryRole();
    const target = env.members.developer;
    await expect(changeMemberRole({ actor: other.members.admin }, { userId: target.userId, role: "admin" })).rejects.toMatchObject({ name: "NotFoundError" });
    await expect(removeMember({ actor: other.members.admin }, { userId: target.userId })).rejects.toMatchObject({ name: "NotFoundError" });
    const stillThere = await listMembers({ actor: env.members.admin });
    expect(stillThere.find((m) => m.userId === target.userId)?.role).toBe("developer");
  });

  it("the last admin can be neither demoted nor removed", async () => {
    const { org, members } = await orgWithEveryRole();
    await expect(changeMemberRole({ actor: members.admin }, { userId: members.admin.userId, role: "engineer" })).rejects.toMatchObject({ name: "InputError" });
    await expect(removeMember({ actor: members.admin }, { userId: members.admin.userId })).rejects.toMatchObject({ name: "InputError" });
    const second = memberOf(org, await createUser(org, "admin"));
    await expect(changeMemberRole({ actor: second }, { userId: members.admin.userId, role: "engineer" })).resolves.toMatchObject({ role: "engineer" });
  });
});
