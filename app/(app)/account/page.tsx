import type { Metadata } from "next";
import { ApiTokens } from "@/components/account/api-tokens";
import { PageHeader } from "@/components/ui/page-header";
import { pageActor, pageAuthorize } from "@/lib/auth/page";
import { formatDateTime } from "@/lib/format";
import { listApiTokensAs } from "@/lib/services/api-tokens";

export const metadata: Metadata = { title: "API tokens" };

export default async function AccountPage() {
  const actor = await pageActor();
  const tokens = await pageAuthorize(() => listApiTokensAs(actor));
  const at = (d: Date | null) => (d ? formatDateTime(d) : null);
  return (
    <>
      <PageHeader
        title="API tokens"
        subtitle={<>Personal tokens for the company&apos;s other systems. A token acts with your roles; the API is described at <a className="underline" href="/api/v1/openapi.json">/api/v1/openapi.json</a>.</>}
      />
      <ApiTokens tokens={tokens.map((t) => ({ id: t.id, name: t.name, createdAt: at(t.createdAt)!, lastUsedAt: at(t.lastUsedAt), revokedAt: at(t.revokedAt) }))} />
    </>
  );
}
