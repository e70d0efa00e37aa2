"use client";
// Buttons that start or discard a draft, and the publish form with its change note.
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { discardDraftAction, openDraftAction, publishDraftAction } from "@/app/(console)/console/profiles/actions";

export function StartDraftButton({ slug, fromVersion }: { slug: string; fromVersion: number }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  return (
    <div className="flex items-center gap-3">
      <Button
        busy={busy}
        onClick={async () => {
          setBusy(true);
          const r = await openDraftAction(slug);
          setBusy(false);
          if (r.ok) router.push(`/console/profiles/${slug}/draft`);
          else setError(r.error);
        }}
      >
        Start a draft from v{fromVersion}
      </Button>
      {error && <p role="alert" className="text-sm text-verdict-fail">{error}</p>}
    </div>
  );
}

export function DiscardDraftButton({ slug }: { slug: string }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [error, setError] = useState<string | null>(null);
  return (
    <>
      <Button variant="ghost" onClick={() => setOpen(true)}>Discard draft</Button>
      <Dialog
        open={open}
        onClose={() => setOpen(false)}
        title="Discard this draft?"
        footer={
          <>
            <Button variant="secondary" onClick={() => setOpen(false)}>Keep it</Button>
            <Button
              variant="danger"
              onClick={async () => {
                const r = await discardDraftAction(slug);
                if (r.ok) {
                  setOpen(false);
                  router.push(`/console/profiles/${slug}`);
                  router.refresh();
                } else setError(r.error);
              }}
            >
              Discard
            </Button>
          </>
        }
      >
        <p>The draft&apos;s edits are lost. Published versions are not affected.</p>
        {error && <p role="alert" className="mt-2 text-verdict-fail">{error}</p>}
      </Dialog>
    </>
  );
}

export function PublishForm({ slug, nextVersion }: { slug: string; nextVersion: number }) {
  const router = useRouter();
  const [note, setNote] = useState("");
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const id = useId();
  return (
    <form
      aria-label="Publish"
      className="space-y-2 rounded-lg border border-ink-100 bg-white p-4"
      onSubmit={async (e) => {
        e.preventDefault();
        setBusy(true);
        setError(null);
        const r = await publishDraftAction(slug, note);
        setBusy(false);
        if (r.ok) {
          router.push(`/console/profiles/${slug}?published=${r.data.version}`);
          router.refresh();
        } else setError(r.issues.find((i) => i.path === "note")?.message ?? r.issues[0]?.message ?? r.error);
      }}
    >
      <h2 className="text-base font-semibold text-ink-900">Publish as version {nextVersion}</h2>
      <p className="text-sm text-ink-600">Publishing freezes the saved draft. Versions can never be edited afterwards; verdicts name the exact version they were graded under. Save your edits first.</p>
      <label htmlFor={id} className="block text-sm font-medium text-ink-800">Change note</label>
      <textarea
        id={id}
        value={note}
        onChange={(e) => setNote(e.target.value)}
        rows={3}
        required
        aria-invalid={!!error || undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        placeholder="What changed and why, e.g. splices tightened to 0.2 dB for the new fusion splicers"
        className="block w-full rounded-md border border-ink-200 px-3 py-2 text-sm focus:border-lumen-600 focus:outline-none focus:ring-2 focus:ring-lumen-100"
      />
      {error && <p id={`${id}-error`} role="alert" className="text-sm font-medium text-verdict-fail">{error}</p>}
      <Button type="submit" busy={busy}>Publish version {nextVersion}</Button>
    </form>
  );
}
