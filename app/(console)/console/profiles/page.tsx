import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/states";
import { CloneTemplateButton } from "@/components/profiles/clone-template-button";
import { DefaultProfileForm } from "@/components/profiles/default-profile-form";
import { getDb } from "@/db";
import { can } from "@/lib/auth/roles";
import { requireMember } from "@/lib/auth/session";
import { listProfiles } from "@/lib/profiles/read";

export const metadata = { title: "Profiles" };

export default async function ProfilesPage() {
  const member = await requireMember("profiles:read");
  const { templates, profiles, defaultRef } = await listProfiles({ db: getDb(), actor: member });
  const canEdit = can(member.role, "profiles:edit");
  const defaultSlug = defaultRef.split("@")[0];
  const options = [
    ...profiles.filter((p) => p.latestVersion !== null).flatMap((p) => [
      { ref: p.slug, label: `${p.name} (${p.slug}, always the latest version)` },
      ...Array.from({ length: p.latestVersion! }, (_, i) => p.latestVersion! - i).map((v) => ({ ref: `${p.slug}@${v}`, label: `${p.name} (${p.slug}@${v}, pinned)` })),
    ]),
    ...templates.map((t) => ({ ref: t.slug, label: `${t.name} (template ${t.slug})` })),
  ];
  return (
    <div className="space-y-8">
      <PageHeader title="Limit profiles" description="The limits verdicts are graded against. Clone a built-in template, tune it as a draft, preview the impact on your stored tests, then publish an immutable version." />

      <section aria-labelledby="default-title" className="space-y-2">
        <h2 id="default-title" className="text-sm font-semibold text-ink-900">Default</h2>
        <DefaultProfileForm current={defaultRef} options={options} canEdit={canEdit} />
      </section>

      <section aria-labelledby="org-profiles-title" className="space-y-2">
        <h2 id="org-profiles-title" className="text-sm font-semibold text-ink-900">Your profiles</h2>
        {profiles.length === 0 ? (
          <EmptyState title="No profiles of your own yet">
            {canEdit ? "Clone a template below to start one." : "An engineer or administrator can clone a template to start one."}
          </EmptyState>
        ) : (
          <div className="overflow-x-auto rounded-md border border-ink-100 bg-white">
            <table className="min-w-full text-left text-sm">
              <caption className="sr-only">Organisation profiles</caption>
              <thead className="bg-ink-50 text-xs uppercase tracking-wide text-ink-600">
                <tr><th className="px-3 py-2">Profile</th><th className="px-3 py-2">Slug</th><th className="px-3 py-2">Latest version</th><th className="px-3 py-2">Draft</th><th className="px-3 py-2">Based on</th></tr>
              </thead>
              <tbody className="divide-y divide-ink-100">
                {profiles.map((p) => (
                  <tr key={p.id}>
                    <td className="px-3 py-2">
                      <Link href={`/console/profiles/${p.slug}`} className="font-medium text-lumen-700 underline-offset-2 hover:underline">{p.name}</Link>
                      {defaultSlug === p.slug && <Badge tone="accent" className="ml-2">default</Badge>}
                    </td>
                    <td className="px-3 py-2 font-mono text-xs">{p.slug}</td>
                    <td className="px-3 py-2">{p.latestVersion === null ? <span className="text-ink-600">never published</span> : `v${p.latestVersion} · ${p.latestPublishedAt?.toISOString().slice(0, 10)}`}</td>
                    <td className="px-3 py-2">{p.hasDraft ? <Badge tone="marginal">open draft</Badge> : <span className="text-ink-600">none</span>}</td>
                    <td className="px-3 py-2 font-mono text-xs text-ink-600">{p.basedOn ?? "–"}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>

      <section aria-labelledby="templates-title" className="space-y-2">
        <h2 id="templates-title" className="text-sm font-semibold text-ink-900">Built-in templates</h2>
        <p className="text-sm text-ink-600">Read-only. Every value names its published source; open a template to read them.</p>
        <div className="overflow-x-auto rounded-md border border-ink-100 bg-white">
          <table className="min-w-full text-left text-sm">
            <caption className="sr-only">Templates</caption>
            <thead className="bg-ink-50 text-xs uppercase tracking-wide text-ink-600">
              <tr><th className="px-3 py-2">Template</th><th className="px-3 py-2">Slug</th><th className="px-3 py-2">Version</th><th className="px-3 py-2"><span className="sr-only">Actions</span></th></tr>
            </thead>
            <tbody className="divide-y divide-ink-100">
              {templates.map((t) => (
                <tr key={t.slug}>
                  <td className="px-3 py-2">
                    <Link href={`/console/profiles/templates/${t.slug}`} className="font-medium text-lumen-700 underline-offset-2 hover:underline">{t.name}</Link>
                    {defaultSlug === t.slug && <Badge tone="accent" className="ml-2">default</Badge>}
                  </td>
                  <td className="px-3 py-2 font-mono text-xs">{t.slug}</td>
                  <td className="px-3 py-2">v{t.version}</td>
                  <td className="px-3 py-2 text-right">{canEdit && <CloneTemplateButton templateSlug={t.slug} templateName={t.name} />}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>
    </div>
  );
}
