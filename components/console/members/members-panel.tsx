"use client";
import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { useMemo, useState } from "react";
import { changeRoleAction, inviteMemberAction, removeMemberAction, revokeInvitationAction } from "@/app/(console)/console/members/actions";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { DataTable } from "@/components/ui/data-table";
import { Dialog } from "@/components/ui/dialog";
import { ErrorState, Notice } from "@/components/ui/states";
import type { Role } from "@/db/schema";
import type { MemberRow, PendingInvitation } from "@/lib/members/members";
import type { InviteInput } from "@/lib/members/schemas";
import { useMembers } from "@/lib/swr/hooks";
import { formatDate } from "../format";
import { InviteForm } from "./invite-form";
import { RoleCell } from "./role-cell";

const mcol = createColumnHelper<MemberRow>();
const icol = createColumnHelper<PendingInvitation>();

export function MembersPanel({ initial, selfId, mailboxEnabled }: { initial: { members: MemberRow[]; invitations: PendingInvitation[] }; selfId: string; mailboxEnabled: boolean }) {
  const { data = initial, error, mutate } = useMembers(initial);
  const [notice, setNotice] = useState<string | null>(null);
  const [rowError, setRowError] = useState<string | null>(null);
  const [removing, setRemoving] = useState<MemberRow | null>(null);
  const [busy, setBusy] = useState(false);

  async function invite(v: InviteInput) {
    setNotice(null);
    const r = await inviteMemberAction(v);
    if (!r.ok) return { error: r.error, field: r.field };
    setNotice(r.data.mailed ? `Invitation sent to ${r.data.email}.` : `Invitation saved for ${r.data.email}, but the mail server refused the message. Revoke it and try again later.`);
    await mutate();
    return null;
  }

  async function changeRole(userId: string, role: Role) {
    setRowError(null);
    const r = await changeRoleAction({ userId, role });
    if (!r.ok) setRowError(r.error);
    await mutate();
  }

  async function confirmRemove() {
    if (!removing) return;
    setBusy(true);
    const r = await removeMemberAction({ userId: removing.userId });
    setBusy(false);
    if (!r.ok) setRowError(r.error);
    setRemoving(null);
    await mutate();
  }

  async function revoke(inv: PendingInvitation) {
    const r = await revokeInvitationAction({ invitationId: inv.id });
    if (!r.ok) setRowError(r.error);
    await mutate();
  }

  const memberColumns = useMemo(
    () => [
      mcol.accessor("name", { header: "Name", cell: (c) => <span className="font-medium">{c.getValue()}{c.row.original.userId === selfId && <span className="ml-1 text-xs text-ink-600">(you)</span>}</span> }),
      mcol.accessor("email", { header: "E-mail" }),
      mcol.accessor("role", {
        header: "Role",
        // Keyed by the stored role, so the staged choice resets once a change is saved.
        cell: (c) => <RoleCell key={c.getValue()} name={c.row.original.name} role={c.getValue()} onSave={(r) => changeRole(c.row.original.userId, r)} />,
      }),
      mcol.accessor("joinedAt", { header: "Joined", cell: (c) => formatDate(c.getValue()) }),
      mcol.display({
        id: "remove",
        header: () => <span className="sr-only">Actions</span>,
        cell: (c) => <Button variant="ghost" size="sm" aria-label={`Remove ${c.row.original.name}`} onClick={() => setRemoving(c.row.original)}>Remove</Button>,
      }),
    ],
    [selfId],
  );

  const invitationColumns = useMemo(
    () => [
      icol.accessor("email", { header: "E-mail" }),
      icol.accessor("role", { header: "Role", cell: (c) => <Badge className="capitalize">{c.getValue()}</Badge> }),
      icol.accessor("createdAt", { header: "Sent", cell: (c) => formatDate(c.getValue()) }),
      icol.accessor("expiresAt", { header: "Expires", cell: (c) => formatDate(c.getValue()) }),
      icol.display({ id: "revoke", header: () => <span className="sr-only">Actions</span>, cell: (c) => <Button variant="ghost" size="sm" onClick={() => revoke(c.row.original)}>Revoke</Button> }),
    ],
    [],
  );

  return (
    <div className="space-y-5">
      <InviteForm onInvite={invite} />
      {notice && (
        <Notice tone="success">
          {notice}{" "}
          {mailboxEnabled && <Link className="underline underline-offset-2" href="/console/mailbox">Open the development mailbox</Link>}
        </Notice>
      )}
      {error && <ErrorState title="Could not load members" onRetry={() => mutate()}>{error.message}</ErrorState>}
      {rowError && <ErrorState title="Not changed">{rowError}</ErrorState>}
      <section aria-labelledby="members-h" className="space-y-2">
        <h2 id="members-h" className="text-sm font-semibold text-ink-900">Members ({data.members.length})</h2>
        <DataTable caption="Members" columns={memberColumns} data={data.members} getRowId={(r) => r.userId} />
      </section>
      <section aria-labelledby="inv-h" className="space-y-2">
        <h2 id="inv-h" className="text-sm font-semibold text-ink-900">Open invitations ({data.invitations.length})</h2>
        {data.invitations.length === 0 ? (
          <p className="text-sm text-ink-600">No open invitations.</p>
        ) : (
          <DataTable caption="Open invitations" columns={invitationColumns} data={data.invitations} getRowId={(r) => r.id} />
        )}
      </section>
      <Dialog
        open={!!removing}
        onClose={() => setRemoving(null)}
        title="Remove this member?"
        footer={
          <>
            <Button variant="secondary" onClick={() => setRemoving(null)}>Cancel</Button>
            <Button variant="danger" busy={busy} onClick={confirmRemove}>Remove</Button>
          </>
        }
      >
        {removing && <p>{removing.name} ({removing.email}) will lose access to this organisation at once. Their API keys stay until you revoke them.</p>}
      </Dialog>
    </div>
  );
}
