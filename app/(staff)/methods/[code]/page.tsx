import Link from "next/link";
import { notFound } from "next/navigation";
import { MethodSettingsForm } from "@/components/methods/method-settings-form";
import { SettingsTable } from "@/components/methods/settings-table";
import { formatDateTime } from "@/lib/format/dates";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listMethodSettings } from "@/lib/server/methods/list-method-settings";

type Props = { params: Promise<{ code: string }> };

export async function generateMetadata({ params }: Props) {
  return { title: `ASTM ${(await params).code} settings` };
}

export default async function MethodSettingsPage({ params }: Props) {
  const actor = await requirePageUser("run.view");
  const code = decodeURIComponent((await params).code).toUpperCase();
  const [method] = await listMethodSettings({ actor, methodCode: code });
  if (!method) notFound();
  const [latest, previous] = method.versions;
  const values = latest?.settings ?? method.definition.defaults;
  return (
    <>
      <p className="muted"><Link href="/methods">Methods</Link> ›</p>
      <div className="page-head">
        <div>
          <h1>ASTM {method.code} settings {latest && <span className="count" data-testid="settings-version">version {latest.version}</span>}</h1>
          <p className="muted">{method.title}</p>
        </div>
      </div>
      <div className="stack-gap">
        <section className="card">
          <h2>In force</h2>
          {latest && <p className="muted">Since {formatDateTime(latest.createdAt)}{latest.createdBy ? `, by ${latest.createdBy.name}` : ""}: {latest.reason}</p>}
          <SettingsTable definition={method.definition} values={values as Record<string, unknown>} previous={previous?.settings as Record<string, unknown> | undefined} />
        </section>
        {can(actor.role, "method.manage") && (
          <section className="card">
            <h2>Change the settings</h2>
            <MethodSettingsForm key={latest?.version ?? 0} methodCode={method.code} basedOnVersion={latest?.version ?? 0} current={values as Record<string, unknown>} />
          </section>
        )}
        <section className="card">
          <h2>Versions <span className="count">{method.versions.length}</span></h2>
          <ol reversed data-testid="settings-versions">
            {method.versions.map((v) => (
              <li key={v.id}>Version {v.version} · {formatDateTime(v.createdAt)} · {v.createdBy?.name ?? "installed with the app"}: {v.reason}</li>
            ))}
          </ol>
        </section>
      </div>
    </>
  );
}
