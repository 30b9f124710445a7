import { ApiTokenList } from "@/components/account/api-token-list";
import { listAllApiTokens } from "@/lib/server/api-tokens/list-api-tokens";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";
import { revokeAnyApiTokenAction } from "./actions";

export const metadata = { title: "API tokens" };

export default async function ApiTokensPage() {
  const actor = await requirePageUser("user.manage");
  const [tokens, zone] = await Promise.all([listAllApiTokens({ actor }), getLabTimeZone()]);
  return (
    <>
      <h1>API tokens</h1>
      <p className="muted">Every person&apos;s tokens. Revoking one stops its requests at once; its past requests stay in the audit trail.</p>
      <section className="card">
        <ApiTokenList tokens={tokens} zone={zone} showOwner revoke={revokeAnyApiTokenAction} />
      </section>
    </>
  );
}
