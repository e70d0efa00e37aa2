import { Suspense } from "react";
import { LaserSafetyNotice } from "@/components/laser-safety-notice";
import { PageHeader } from "@/components/ui/page-header";
import { Spinner } from "@/components/ui/states";
import { VerdictTable } from "@/components/verdicts/verdict-table";
import { requireMember } from "@/lib/auth/session";

export const metadata = { title: "Verdicts" };

export default async function VerdictsPage() {
  await requireMember("verdicts:read");
  return (
    <div className="space-y-5">
      <PageHeader title="Verdicts" description="Every graded test, newest first. Verdicts never change once stored; open one to see the link, the budget and the reasons, or to replay it." />
      <Suspense fallback={<Spinner label="Loading verdicts" />}>
        <VerdictTable />
      </Suspense>
      <LaserSafetyNotice compact />
    </div>
  );
}
