import Link from "next/link";
import { ChangePasswordForm } from "@/components/account/change-password-form";
import { ApiTokenList } from "@/components/account/api-token-list";
import { CreateApiTokenForm } from "@/components/account/create-api-token-form";
import { scopesForRole } from "@/lib/policy/api-tokens";
import { ResultUnitsForm } from "@/components/account/result-units-form";
import { ROLE_LABELS } from "@/lib/policy/permissions";
import { listOwnApiTokens } from "@/lib/server/api-tokens/list-api-tokens";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";
import { revokeOwnApiTokenAction } from "./actions";

export const metadata = { title: "My account" };

export default async function AccountPage() {
  const user = await requirePageUser("account.self");
  const [tokens, zone] = await Promise.all([listOwnApiTokens({ actor: user }), getLabTimeZone()]);
  const scopes = scopesForRole(user.role);
  return (
    <>
      <h1>My account</h1>
      <p className="muted">{user.name} · {user.email} · {ROLE_LABELS[user.role]}</p>
      <section className="card" style={{ maxWidth: "34rem" }}>
        <h2>Change password</h2>
        <ChangePasswordForm />
      </section>
      {scopes.length > 0 && (
        <section className="card" aria-label="API tokens">
          <h2>API tokens</h2>
          <p className="muted">
            A token lets a program (a data-logger, a register) use the <Link href="/api-docs">Seepline API</Link> as you, within its scope. Every request made with
            it is in the audit trail under its name and yours. Revoke a token the moment it is no longer needed or may have been seen by someone else.
          </p>
          <ApiTokenList tokens={tokens} zone={zone} showOwner={false} revoke={revokeOwnApiTokenAction} />
          <h3>New token</h3>
          <CreateApiTokenForm scopes={scopes} />
        </section>
      )}
      <section className="card" style={{ maxWidth: "34rem" }}>
        <h2>Units of results</h2>
        <ResultUnitsForm current={user.resultUnits ?? "SI"} />
      </section>
    </>
  );
}
