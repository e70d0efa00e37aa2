import Link from "next/link";
import { notFound } from "next/navigation";
import { Badge } from "@/components/ui/badge";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, Notice } from "@/components/ui/states";
import { DiscardDraftButton, StartDraftButton } from "@/components/profiles/draft-actions";
import { VersionDiff } from "@/components/profiles/version-diff";
import { getDb } from "@/db";
import { NotFoundError } from "@/lib/auth/errors";
import { can } from "@/lib/auth/roles";
import { requireMember } from "@/lib/auth/session";
import { getProfileDetail } from "@/lib/profiles/read";

export const metadata = { title: "Profile" };

export default async function ProfilePage({ params, searchParams }: { params: Promise<{ slug: string }>; searchParams: Promise<{ published?: string }> }) {
  const member = await requireMember("profiles:read");
  const { slug } = await params;
  const { published } = await searchParams;
  const p = await getProfileDetail({ db: getDb(), actor: member }, slug).catch((err) => {
    if (err instanceof NotFoundError) notFound();
    throw err;
  });
  const canEdit = can(member.role, "profiles:edit");
  const latest = p.versions[0]?.version;
  const isDefault = p.defaultRef === slug || p.defaultRef.startsWith(`${slug}@`);
  const sides = [
    ...p.versions.map((v) => ({ value: String(v.version), label: `v${v.version}` })),
    ...(p.draft ? [{ value: "draft", label: "Open draft" }] : []),
    ...(p.basedOn ? [{ value: "template", label: `Template ${p.basedOn}` }] : []),
  ];
  return (
    <div className="space-y-8">
      <PageHeader
        title={p.name}
        description={<span>Profile <span className="font-mono">{p.slug}</span>{p.basedOn && <> · cloned from <span className="font-mono">{p.basedOn}</span></>}{isDefault && <Badge tone="accent" className="ml-2">default: {p.defaultRef}</Badge>}</span>}
        actions={<Link href="/console/profiles" className="text-sm text-lumen-700 underline-offset-2 hover:underline">All profiles</Link>}
      />
      {published && <Notice tone="success">Version {published} is published. Set it as the default on the profiles page when you are ready.</Notice>}

      <section aria-labelledby="draft-title" className="space-y-2">
        <h2 id="draft-title" className="text-sm font-semibold text-ink-900">Draft</h2>
        {p.draft ? (
          <div className="flex flex-wrap items-center gap-3">
            <Link href={`/console/profiles/${slug}/draft`} className="rounded-md bg-ink-800 px-3.5 py-2 text-sm font-medium text-white hover:bg-ink-900">
              {canEdit ? "Edit draft" : "View draft"}
            </Link>
            <span className="text-sm text-ink-600">last saved {p.draftUpdatedAt?.toISOString().replace("T", " ").slice(0, 16)} UTC</span>
            {canEdit && latest !== undefined && <DiscardDraftButton slug={slug} />}
          </div>
        ) : canEdit && latest !== undefined ? (
          <StartDraftButton slug={slug} fromVersion={latest} />
        ) : (
          <p className="text-sm text-ink-600">No open draft.</p>
        )}
      </section>

      <section aria-labelledby="versions-title" className="space-y-2">
        <h2 id="versions-title" className="text-sm font-semibold text-ink-900">Published versions</h2>
        {p.versions.length === 0 ? (
          <EmptyState title="Not published yet">Verdicts can only be graded under a published version.</EmptyState>
        ) : (
          <div className="overflow-x-auto rounded-md border border-ink-100 bg-white">
            <table className="min-w-full text-left text-sm">
              <caption className="sr-only">Published versions</caption>
              <thead className="bg-ink-50 text-xs uppercase tracking-wide text-ink-600">
                <tr><th className="px-3 py-2">Version</th><th className="px-3 py-2">Published (UTC)</th><th className="px-3 py-2">Change note</th><th className="px-3 py-2">Verdicts</th></tr>
              </thead>
              <tbody className="divide-y divide-ink-100">
                {p.versions.map((v) => (
                  <tr key={v.id} className="align-top">
                    <td className="px-3 py-2 font-mono">{slug}@{v.version}</td>
                    <td className="whitespace-nowrap px-3 py-2">{v.publishedAt.toISOString().replace("T", " ").slice(0, 16)}</td>
                    <td className="px-3 py-2">{v.note}</td>
                    <td className="px-3 py-2"><Link className="text-lumen-700 underline-offset-2 hover:underline" href={`/console/verdicts?profile=${slug}@${v.version}`}>graded under it</Link></td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>

      {sides.length >= 2 && (
        <section aria-labelledby="diff-title" className="space-y-2">
          <h2 id="diff-title" className="text-sm font-semibold text-ink-900">Compare</h2>
          <VersionDiff slug={slug} sides={sides} initialFrom={sides[1].value} initialTo={sides[0].value} />
        </section>
      )}
    </div>
  );
}
