import type { Metadata } from "next";
import { AcceptInvitationForm } from "@/components/auth/accept-invitation-form";
import { ErrorState } from "@/components/ui/states";
import { previewInvitation } from "@/lib/members/invitations";

export const metadata: Metadata = { title: "Accept invitation" };
export const dynamic = "force-dynamic";

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const inv = token.length >= 20 && token.length <= 200 ? await previewInvitation(token) : null;
  if (!inv) {
    return (
      <>
        <h1 className="mb-4 text-lg font-semibold text-ink-900">Invitation</h1>
        <ErrorState title="This invitation no longer works">It was used, revoked or has expired. Ask your administrator to send a new one.</ErrorState>
      </>
    );
  }
  return (
    <>
      <h1 className="mb-1 text-lg font-semibold text-ink-900">Join {inv.organisationName}</h1>
      <p className="mb-4 text-sm text-ink-600">
        You were invited as <strong className="capitalize">{inv.role}</strong> with <strong>{inv.email}</strong>.
        {inv.hasAccount ? " You already have an account: joining adds this organisation to it." : " Choose your name and password to create your account."}
      </p>
      <AcceptInvitationForm token={token} hasAccount={inv.hasAccount} />
    </>
  );
}
