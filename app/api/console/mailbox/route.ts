// GET /api/console/mailbox — what the development SMTP receiver caught (only when DEV_MAILBOX=1).
import { assertCan } from "@/lib/auth/context";
import { withConsoleSession } from "@/lib/auth/console-route";
import { NotFoundError } from "@/lib/auth/errors";
import { listMailbox } from "@/lib/mail/mailbox";
import { devMailboxEnabled } from "@/lib/mail/config";

export const dynamic = "force-dynamic";
export const GET = withConsoleSession(async ({ member, url }) => {
  if (!devMailboxEnabled()) throw new NotFoundError("The development mailbox is switched off.");
  assertCan(member, "mailbox:read");
  return Response.json(await listMailbox({ to: url.searchParams.get("to") ?? undefined }));
});
