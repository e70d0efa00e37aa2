import type { Metadata } from "next";
import { RetentionForm } from "@/components/console/retention/retention-form";
import { PageHeader } from "@/components/ui/page-header";
import { requireMember } from "@/lib/auth/session";
import { getRetention } from "@/lib/retention/call-log";
import { saveRetention } from "./actions";

export const metadata: Metadata = { title: "Data retention" };
export const dynamic = "force-dynamic";

export default async function RetentionPage() {
  const m = await requireMember("retention:manage");
  const current = await getRetention({ actor: m });
  return (
    <>
      <PageHeader
        title="Data retention"
        description="How long the call log keeps each API call. Tests and verdicts are never removed by retention: they form the audit chain that replay and chain checks rely on."
      />
      <RetentionForm current={current.callLogDays} onSave={saveRetention} />
    </>
  );
}
