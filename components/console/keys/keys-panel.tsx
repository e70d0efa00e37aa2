"use client";
import { createColumnHelper } from "@tanstack/react-table";
import { useMemo, useState } from "react";
import { createKeyAction, revokeKeyAction } from "@/app/(console)/console/keys/actions";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { DataTable } from "@/components/ui/data-table";
import { Dialog } from "@/components/ui/dialog";
import { EmptyState, ErrorState } from "@/components/ui/states";
import type { CreatedKey, KeySummary } from "@/lib/keys/manage";
import type { CreateKeyInput } from "@/lib/keys/manage-schemas";
import { useKeys } from "@/lib/swr/hooks";
import { formatDate, formatDateTime } from "../format";
import { CreateKeyForm } from "./create-key-form";
import { SecretOnce } from "./secret-once";

const col = createColumnHelper<KeySummary>();
const STATUS_TONE = { active: "pass", expired: "marginal", revoked: "neutral" } as const;

export function KeysPanel({ initialKeys, canCreateLive, showsAllKeys }: { initialKeys: KeySummary[]; canCreateLive: boolean; showsAllKeys: boolean }) {
  const { data: keys = [], error, mutate } = useKeys(initialKeys);
  const [creating, setCreating] = useState(false);
  const [created, setCreated] = useState<CreatedKey | null>(null);
  const [createError, setCreateError] = useState<{ error: string; field?: string } | null>(null);
  const [revoking, setRevoking] = useState<KeySummary | null>(null);
  const [revokeBusy, setRevokeBusy] = useState(false);
  const [revokeError, setRevokeError] = useState<string | null>(null);

  async function submit(v: CreateKeyInput) {
    setCreateError(null);
    const r = await createKeyAction(v);
    if (!r.ok) return setCreateError(r);
    setCreating(false);
    setCreated(r.data);
    await mutate();
  }

  async function confirmRevoke() {
    if (!revoking) return;
    setRevokeBusy(true);
    setRevokeError(null);
    const r = await revokeKeyAction({ keyId: revoking.id });
    setRevokeBusy(false);
    if (!r.ok) return setRevokeError(r.error);
    setRevoking(null);
    await mutate();
  }

  const columns = useMemo(
    () => [
      col.accessor("name", { header: "Name", cell: (c) => <span className="font-medium">{c.getValue()}</span> }),
      col.accessor("start", { header: "Key", cell: (c) => <code className="text-xs">{c.getValue()}</code> }),
      col.accessor("environment", { header: "Env", cell: (c) => <Badge tone={c.getValue() === "live" ? "accent" : "neutral"}>{c.getValue()}</Badge> }),
      col.accessor("scopes", { header: "Scopes", cell: (c) => <span className="text-xs">{c.getValue().join(", ")}</span> }),
      col.accessor("createdAt", {
        header: "Created",
        cell: (c) => (
          <span className="whitespace-nowrap">
            {formatDate(c.getValue())}
            {showsAllKeys && <span className="block text-xs text-ink-600">{c.row.original.createdBy ?? "—"}</span>}
          </span>
        ),
      }),
      col.accessor("lastUsedAt", { header: "Last used", cell: (c) => formatDateTime(c.getValue()) }),
      col.accessor("expiresAt", { header: "Expires", cell: (c) => formatDate(c.getValue()) }),
      col.accessor("status", { header: "Status", cell: (c) => <Badge tone={STATUS_TONE[c.getValue()]}>{c.getValue()}</Badge> }),
      col.display({
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        cell: (c) =>
          c.row.original.status === "revoked" ? null : (
            <Button variant="ghost" size="sm" onClick={() => { setRevokeError(null); setRevoking(c.row.original); }} aria-label={`Revoke ${c.row.original.name}`}>
              Revoke
            </Button>
          ),
      }),
    ],
    [showsAllKeys],
  );

  return (
    <section aria-label="API keys" className="space-y-4">
      <div className="flex justify-end">
        <Button onClick={() => { setCreateError(null); setCreating(true); }}>Create key</Button>
      </div>
      {error && <ErrorState title="Could not load the keys" onRetry={() => mutate()}>{error.message}</ErrorState>}
      {keys.length === 0 ? (
        <EmptyState title="No keys yet" action={<Button onClick={() => setCreating(true)}>Create your first key</Button>}>
          A key lets a work-order or activation system post tests for grading. Start with a sandbox key.
        </EmptyState>
      ) : (
        <DataTable caption="API keys" columns={columns} data={keys} getRowId={(k) => k.id} />
      )}

      <Dialog open={creating} onClose={() => setCreating(false)} title="Create an API key">
        <CreateKeyForm canCreateLive={canCreateLive} onSubmit={submit} onCancel={() => setCreating(false)} serverError={createError} />
      </Dialog>

      <Dialog
        open={!!created}
        onClose={() => setCreated(null)}
        title={created ? `Key “${created.name}” created` : "Key created"}
        footer={<Button onClick={() => setCreated(null)}>I have stored it</Button>}
      >
        {created && <SecretOnce secret={created.secret} />}
      </Dialog>

      <Dialog
        open={!!revoking}
        onClose={() => setRevoking(null)}
        title="Revoke this key?"
        footer={
          <>
            <Button variant="secondary" onClick={() => setRevoking(null)}>Keep it</Button>
            <Button variant="danger" busy={revokeBusy} onClick={confirmRevoke}>Revoke key</Button>
          </>
        }
      >
        {revoking && (
          <p>
            Calls with <code className="text-xs">{revoking.start}</code> ({revoking.name}) will be refused with 401 from now on.
            This cannot be undone; create a new key if a system still needs access.
          </p>
        )}
        {revokeError && <p role="alert" className="mt-2 font-medium text-verdict-fail">{revokeError}</p>}
      </Dialog>
    </section>
  );
}
