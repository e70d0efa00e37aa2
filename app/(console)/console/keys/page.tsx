import type { Metadata } from "next";
import { KeysPanel } from "@/components/console/keys/keys-panel";
import { PageHeader } from "@/components/ui/page-header";
import { can } from "@/lib/auth/roles";
import { requireMember } from "@/lib/auth/session";
import { listKeys } from "@/lib/keys/manage";

export const metadata: Metadata = { title: "API keys" };
export const dynamic = "force-dynamic";

export default async function KeysPage() {
  const m = await requireMember("keys:manage-own");
  const keys = await listKeys({ actor: m });
  const all = can(m.role, "keys:manage-all");
  return (
    <>
      <PageHeader
        title="API keys"
        description={
          <>
            {all ? "Every key of your organisation." : "The keys you created."} Systems send a key as{" "}
            <code className="text-xs">Authorization: Bearer &lt;key&gt;</code>. Sandbox keys (<code className="text-xs">gg_sbx_</code>)
            are for trying the API; live keys (<code className="text-xs">gg_live_</code>) grade real work.
          </>
        }
      />
      <KeysPanel initialKeys={keys} canCreateLive={can(m.role, "keys:create-live")} showsAllKeys={all} />
    </>
  );
}
