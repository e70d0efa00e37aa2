import type { Metadata } from "next";
import { CallLogPanel } from "@/components/console/call-log/call-log-panel";
import { PageHeader } from "@/components/ui/page-header";
import { can } from "@/lib/auth/roles";
import { requireMember } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Call log" };
export const dynamic = "force-dynamic";

export default async function CallLogPage() {
  const m = await requireMember("calllog:read-own");
  return (
    <>
      <PageHeader
        title="Call log"
        description={
          can(m.role, "calllog:read-all")
            ? "Every API call made in your organisation: who called, which route, the status and how long it took."
            : "The API calls made with your keys and from your console session."
        }
      />
      <CallLogPanel />
    </>
  );
}
