import Link from "next/link";
import { notFound } from "next/navigation";
import { PageHeader } from "@/components/ui/page-header";
import { CloneTemplateButton } from "@/components/profiles/clone-template-button";
import { DraftEditor } from "@/components/profiles/draft-editor";
import { can } from "@/lib/auth/roles";
import { requireMember } from "@/lib/auth/session";
import { templateBySlug } from "@/lib/profiles/limits";
import type { DraftLimits } from "@/lib/profiles/limits-schema";

export const metadata = { title: "Template" };

export default async function TemplatePage({ params }: { params: Promise<{ slug: string }> }) {
  const member = await requireMember("profiles:read");
  const { slug } = await params;
  const t = templateBySlug(slug);
  if (!t) notFound();
  return (
    <div className="space-y-6">
      <PageHeader
        title={t.name}
        description={<span>Built-in template <span className="font-mono">{t.slug}@{t.version}</span>, read-only. Clone it to tune the limits.</span>}
        actions={
          <div className="flex items-center gap-3">
            {can(member.role, "profiles:edit") && <CloneTemplateButton templateSlug={t.slug} templateName={t.name} />}
            <Link href="/console/profiles" className="text-sm text-lumen-700 underline-offset-2 hover:underline">All profiles</Link>
          </div>
        }
      />
      <DraftEditor slug={t.slug} initial={structuredClone(t.limits) as DraftLimits} canEdit={false} />
    </div>
  );
}
