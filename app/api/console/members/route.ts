// GET /api/console/members — members and open invitations of the current organisation (admins only).
import { withConsoleSession } from "@/lib/auth/console-route";
import { listMembers, listPendingInvitations } from "@/lib/members/members";

export const dynamic = "force-dynamic";
export const GET = withConsoleSession(async ({ member }) =>
  Response.json({ members: await listMembers({ actor: member }), invitations: await listPendingInvitations({ actor: member }) }),
);
