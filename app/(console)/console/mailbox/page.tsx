import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { MailboxPanel } from "@/components/console/mailbox/mailbox-panel";
import { PageHeader } from "@/components/ui/page-header";
import { requireMember } from "@/lib/auth/session";
import { devMailboxEnabled } from "@/lib/mail/config";

export const metadata: Metadata = { title: "Development mailbox" };
export const dynamic = "force-dynamic";

export default async function MailboxPage() {
  await requireMember("mailbox:read");
  if (!devMailboxEnabled()) notFound();
  return (
    <>
      <PageHeader
        title="Development mailbox"
        description="Everything Glassgrade sent through the local fake mail server: invitations and password resets. It exists only in development and tests; production mail goes to your SMTP relay."
      />
      <MailboxPanel />
    </>
  );
}
