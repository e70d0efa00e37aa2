import { PERMISSIONS, ROLES, type Permission } from "@/lib/auth/roles";

// Plain-language names for the permission table in lib/auth/roles.ts, which stays the single source.
export const PERMISSION_LABELS: Record<Permission, string> = {
  "members:manage": "Invite and remove members, change roles",
  "retention:manage": "Set how long the call log is kept",
  "keys:manage-all": "Manage every API key of the organisation",
  "keys:manage-own": "Create and revoke their own API keys",
  "keys:create-live": "Create live keys (others: sandbox only)",
  "profiles:read": "Read limit profiles",
  "profiles:edit": "Edit and publish limit profiles",
  "verdicts:read": "Read verdicts",
  "verdicts:replay": "Replay verdicts",
  "audit:export": "Verify the audit chain and export audit packs",
  "calllog:read-all": "Read the whole call log",
  "calllog:read-own": "Read the call log of their own keys",
  "apidocs:try": "Try API calls from the reference",
  "apidocs:read": "Read the API reference",
  "overview:read": "See the overview",
  "mailbox:read": "Read the development mailbox",
};

export function RoleMatrix() {
  const perms = Object.keys(PERMISSIONS) as Permission[];
  return (
    <section aria-labelledby="role-matrix" className="mt-8">
      <h2 id="role-matrix" className="text-sm font-semibold text-ink-900">What each role may do</h2>
      <div className="mt-2 overflow-x-auto rounded-md border border-ink-100 bg-white">
        <table className="min-w-full text-sm">
          <thead className="bg-ink-50 text-xs uppercase tracking-wide text-ink-600">
            <tr>
              <th scope="col" className="px-3 py-2 text-left font-medium">Permission</th>
              {ROLES.map((r) => <th key={r} scope="col" className="px-3 py-2 font-medium capitalize">{r}</th>)}
            </tr>
          </thead>
          <tbody className="divide-y divide-ink-100">
            {perms.map((p) => (
              <tr key={p}>
                <th scope="row" className="px-3 py-1.5 text-left font-normal text-ink-800">{PERMISSION_LABELS[p]}</th>
                {ROLES.map((r) => {
                  const yes = (PERMISSIONS[p] as readonly string[]).includes(r);
                  return (
                    <td key={r} className="px-3 py-1.5 text-center">
                      {yes ? <span aria-label="yes" className="font-semibold text-lumen-700">✓</span> : <span aria-label="no" className="text-ink-200">·</span>}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
