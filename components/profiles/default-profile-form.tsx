"use client";
// Chooses what the API grades under when a call names no profile.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/field";
import { setDefaultProfileAction } from "@/app/(console)/console/profiles/actions";

export function DefaultProfileForm({ current, options, canEdit }: { current: string; options: { ref: string; label: string }[]; canEdit: boolean }) {
  const [value, setValue] = useState(current);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const known = options.some((o) => o.ref === current) ? options : [{ ref: current, label: current }, ...options];
  return (
    <form
      className="flex flex-wrap items-end gap-3"
      onSubmit={async (e) => {
        e.preventDefault();
        setBusy(true);
        setMessage(null);
        const r = await setDefaultProfileAction(value);
        setBusy(false);
        setMessage(r.ok ? { ok: true, text: `Default is now ${r.data.ref}.` } : { ok: false, text: r.issues[0]?.message ?? r.error });
      }}
    >
      <div className="w-full max-w-xl">
        <Select label="Default profile for API calls" value={value} onChange={(e) => setValue(e.target.value)} disabled={!canEdit || busy} error={message && !message.ok ? message.text : undefined}>
          {known.map((o) => <option key={o.ref} value={o.ref}>{o.label}</option>)}
        </Select>
      </div>
      {canEdit && <Button type="submit" variant="secondary" busy={busy} disabled={value === current}>Set default</Button>}
      {message?.ok && <p role="status" className="text-sm text-verdict-pass">{message.text}</p>}
    </form>
  );
}
