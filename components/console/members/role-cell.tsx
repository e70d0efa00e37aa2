"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { Role } from "@/db/schema";

const ROLES: Role[] = ["admin", "engineer", "auditor", "developer"];

// Picking a role only stages it; Save applies it. Arrow keys on a closed select change its value, so
// applying on change would send a role change per key press.
export function RoleCell({ name, role, onSave }: { name: string; role: Role; onSave: (r: Role) => Promise<void> }) {
  const [staged, setStaged] = useState<Role>(role);
  const [busy, setBusy] = useState(false);
  const dirty = staged !== role;
  return (
    <span className="inline-flex items-center gap-1.5">
      <select
        aria-label={`Role of ${name}`}
        value={staged}
        onChange={(e) => setStaged(e.target.value as Role)}
        className="rounded border border-ink-200 bg-white px-1.5 py-0.5 text-sm capitalize"
      >
        {ROLES.map((r) => <option key={r} value={r}>{r}</option>)}
      </select>
      {dirty && (
        <>
          <Button size="sm" busy={busy} aria-label={`Save role of ${name}`} onClick={async () => { setBusy(true); await onSave(staged); setBusy(false); }}>
            Save
          </Button>
          <Button size="sm" variant="ghost" onClick={() => setStaged(role)}>Undo</Button>
        </>
      )}
    </span>
  );
}
