import Link from "next/link";
import { SchemaFields, typeWords, type Schema } from "@/components/api/schema-fields";
import { getOpenApiDocument } from "@/lib/server/api/openapi-document";

export const metadata = { title: "API reference" };

type Operation = {
  summary?: string;
  description?: string;
  parameters?: Array<{ name: string; in: string; required?: boolean; description?: string; schema?: Schema }>;
  requestBody?: { content: Record<string, { schema: Schema }> };
  responses: Record<string, { description: string; content?: Record<string, { schema: Schema }> }>;
};

/** The API described for people, from the same generated OpenAPI document that /api/v1/openapi.json serves. */
export default function ApiDocsPage() {
  const doc = getOpenApiDocument();
  const paths = Object.entries(doc.paths ?? {}) as Array<[string, Record<string, Operation>]>;
  const schemas = Object.entries((doc.components?.schemas ?? {}) as Record<string, Schema>);
  return (
    <main className="stack" id="main" tabIndex={-1} style={{ maxWidth: "60rem", margin: "0 auto", padding: "1.5rem" }}>
      <h1>{doc.info.title}, version {doc.info.version}</h1>
      <p>{doc.info.description}</p>
      <p className="muted">
        Every request carries a token from My account in the header <code>Authorization: Bearer …</code>. The machine-readable description is at{" "}
        <a href="/api/v1/openapi.json">/api/v1/openapi.json</a> (OpenAPI 3.1). <Link href="/">Back to Seepline</Link>
      </p>
      <nav aria-label="Requests">
        <ul className="link-list">{paths.flatMap(([path, ops]) => Object.keys(ops).map((m) => <li key={`${m} ${path}`}><a href={`#${m}-${path}`}><code>{m.toUpperCase()} /api/v1{path}</code></a></li>))}</ul>
      </nav>
      {paths.flatMap(([path, ops]) =>
        Object.entries(ops).map(([method, op]) => (
          <section className="card" key={`${method} ${path}`} id={`${method}-${path}`}>
            <h2><code>{method.toUpperCase()} /api/v1{path}</code></h2>
            {op.summary && <p><strong>{op.summary}</strong></p>}
            {op.description && <p>{op.description}</p>}
            {op.parameters?.length ? (
              <table className="list">
                <thead><tr><th>Parameter</th><th>In</th><th>Type</th><th>Meaning</th></tr></thead>
                <tbody>{op.parameters.map((p) => <tr key={`${p.in}-${p.name}`}><td className="mono">{p.name}{p.required ? "" : " (optional)"}</td><td>{p.in}</td><td>{typeWords(p.schema)}</td><td>{p.description ?? p.schema?.description ?? ""}</td></tr>)}</tbody>
              </table>
            ) : null}
            {op.requestBody && <><h3>Body</h3><p>{typeWords(op.requestBody.content["application/json"]?.schema)}</p></>}
            <h3>Answers</h3>
            <ul>{Object.entries(op.responses).map(([status, r]) => <li key={status}><strong>{status}</strong> {r.description} {r.content && <span className="muted">({Object.entries(r.content).map(([type, c]) => `${type}: ${typeWords(c.schema)}`).join(", ")})</span>}</li>)}</ul>
          </section>
        )),
      )}
      <h2>Shapes</h2>
      {schemas.map(([name, schema]) => (
        <section className="card" key={name} id={`schema-${name}`}>
          <h3>{name}</h3>
          {schema.description && <p>{schema.description}</p>}
          <SchemaFields schema={schema} />
        </section>
      ))}
    </main>
  );
}
