import Link from "next/link";
import { notFound } from "next/navigation";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/states";
import { DraftEditor } from "@/components/profiles/draft-editor";
import { PublishForm, StartDraftButton } from "@/components/profiles/draft-actions";
import { getDb } from "@/db";
import { NotFoundError } from "@/lib/auth/errors";
import { can } from "@/lib/auth/roles";
import { requireMember } from "@/lib/auth/session";
import type { DraftLimits } from "@/lib/profiles/limits-schema";
import { getProfileDetail } from "@/lib/profiles/read";

export const metadata = { title: "Edit draft" };

export default async function DraftPage({ params }: { params: Promise<{ slug: string }> }) {
  const member = await requireMember("profiles:read");
  const { slug } = await params;
  const p = await getProfileDetail({ db: getDb(), actor: member }, slug).catch((err) => {
    if (err instanceof NotFoundError) notFound();
    throw err;
  });
  const canEdit = can(member.role, "profiles:edit");
  const latest = p.versions[0]?.version;
  return (
    <div className="space-y-6">
      <PageHeader
        title={`${p.name}: draft of v${(latest ?? 0) + 1}`}
        description="Every limit with the source it comes from. Values are checked as you leave each field and again when you save."
        actions={
          <div className="flex items-center gap-4 text-sm">
            {p.draft && canEdit && <a href="#preview-title" className="text-lumen-700 underline-offset-2 hover:underline">Impact preview and publish ↓</a>}
            <Link href={`/console/profiles/${slug}`} className="text-lumen-700 underline-offset-2 hover:underline">Versions and compare</Link>
          </div>
        }
      />
      {p.draft ? (
        <>
          <DraftEditor slug={slug} initial={p.draft as DraftLimits} canEdit={canEdit} />
          {canEdit && <PublishForm slug={slug} nextVersion={(latest ?? 0) + 1} />}
        </>
      ) : (
        <EmptyState title="No open draft" action={canEdit && latest !== undefined ? <StartDraftButton slug={slug} fromVersion={latest} /> : undefined}>
          Drafts start from the latest published version.
        </EmptyState>
      )}
    </div>
  );
}
