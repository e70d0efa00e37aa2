import { requireMember } from "@/lib/auth/session";
import { PageHeader } from "@/components/ui/page-header";

export default async function OverviewPage() {
  const m = await requireMember("overview:read");
  return <PageHeader title="Overview" description={`Signed in to ${m.organisationName}.`} />;
}
