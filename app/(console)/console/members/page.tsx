import type { Metadata } from "next";
import { MembersPanel } from "@/components/console/members/members-panel";
import { RoleMatrix } from "@/components/console/members/role-matrix";
import { PageHeader } from "@/components/ui/page-header";
import { requireMember } from "@/lib/auth/session";
import { devMailboxEnabled } from "@/lib/mail/config";
import { listMembers, listPendingInvitations } from "@/lib/members/members";

export const metadata: Metadata = { title: "Members" };
export const dynamic = "force-dynamic";

export default async function MembersPage() {
  const m = await requireMember("members:manage");
  const [members, invitations] = await Promise.all([listMembers({ actor: m }), listPendingInvitations({ actor: m })]);
  return (
    <>
      <PageHeader title="Members" description={`Who can sign in to ${m.organisationName} and what each role may do. Invitations go out by e-mail and work once, for seven days.`} />
      <MembersPanel initial={{ members, invitations }} selfId={m.userId} mailboxEnabled={devMailboxEnabled()} />
      <RoleMatrix />
    </>
  );
}
