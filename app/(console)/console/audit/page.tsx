import { BulkReplay, ChainCheck, PackExport } from "@/components/audit/audit-tools";
import { PageHeader } from "@/components/ui/page-header";
import { can } from "@/lib/auth/roles";
import { requireMember } from "@/lib/auth/session";

export const metadata = { title: "Audit" };

export default async function AuditPage() {
  const member = await requireMember("verdicts:replay");
  return (
    <div className="space-y-5">
      <PageHeader title="Audit" description="Show that every stored verdict is still what was issued: check the tamper-evident chain, replay a period under the exact profile versions, and hand over a pack an outside party can verify." />
      <div className="grid gap-5">
        <ChainCheck />
        <BulkReplay />
        <PackExport allowed={can(member.role, "audit:export")} />
      </div>
    </div>
  );
}
