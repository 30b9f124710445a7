import Link from "next/link";
import { CreateSpecificationForm } from "@/components/specifications/create-specification-form";
import styles from "@/components/specifications/specifications.module.css";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listSpecifications } from "@/lib/server/specifications/list-specifications";

export const metadata = { title: "New project specification" };

type Props = { searchParams: Promise<{ projectId?: string | string[] }> };

export default async function NewSpecificationPage({ searchParams }: Props) {
  const actor = await requirePageUser("specification.manage");
  const asked = (await searchParams).projectId;
  const { templates, projects } = await listSpecifications({ actor });
  return (
    <>
      <p className="muted"><Link href="/specifications">Specifications</Link> ›</p>
      <h1>New project specification</h1>
      <p className="muted">Start from one of the lab's templates and adjust its limits to what the project's specification says, or start empty and enter them.</p>
      <section className={`card ${styles.narrowCard}`}>
        <CreateSpecificationForm
          projects={projects.map((p) => ({ id: p.id, code: p.code, label: `${p.code} · ${p.name} (${p.clientOrganization.name})` }))}
          templates={templates.map((t) => ({ id: t.id, label: t.name }))}
          projectId={typeof asked === "string" ? asked : undefined}
        />
      </section>
    </>
  );
}
