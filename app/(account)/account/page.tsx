import { ChangePasswordForm } from "@/components/account/change-password-form";
import { ResultUnitsForm } from "@/components/account/result-units-form";
import { ROLE_LABELS } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";

export const metadata = { title: "My account" };

export default async function AccountPage() {
  const user = await requirePageUser("account.self");
  return (
    <>
      <h1>My account</h1>
      <p className="muted">{user.name} · {user.email} · {ROLE_LABELS[user.role]}</p>
      <section className="card" style={{ maxWidth: "34rem" }}>
        <h2>Change password</h2>
        <ChangePasswordForm />
      </section>
      <section className="card" style={{ maxWidth: "34rem" }}>
        <h2>Units of results</h2>
        <ResultUnitsForm current={user.resultUnits ?? "SI"} />
      </section>
    </>
  );
}
