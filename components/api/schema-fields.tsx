type Schema = { type?: string | string[]; $ref?: string; properties?: Record<string, Schema>; required?: string[]; items?: Schema; enum?: unknown[]; description?: string; anyOf?: Schema[]; minimum?: number; maximum?: number; minLength?: number; maxLength?: number; minItems?: number; maxItems?: number };

/** A schema's type in a few words: "string", "array of Roll", "KPA | PSI". */
export function typeWords(schema: Schema | undefined): string {
  if (!schema) return "any";
  if (schema.$ref) return schema.$ref.split("/").pop() ?? "object";
  if (schema.enum) return schema.enum.map(String).join(" | ");
  if (schema.anyOf) return schema.anyOf.map(typeWords).join(" or ");
  const types = Array.isArray(schema.type) ? schema.type : schema.type ? [schema.type] : [];
  if (types.includes("array")) return `array of ${typeWords(schema.items)}`;
  return types.length ? types.join(" or ") : "any";
}

function limits(s: Schema): string {
  const parts: string[] = [];
  if (s.minLength !== undefined || s.maxLength !== undefined) parts.push(`${s.minLength ?? 0} to ${s.maxLength ?? "…"} characters`);
  if (s.minItems !== undefined || s.maxItems !== undefined) parts.push(`${s.minItems ?? 0} to ${s.maxItems ?? "…"} items`);
  return parts.join("; ");
}

/** The fields of an object schema as a table: name, type, required, what it means. */
export function SchemaFields({ schema }: { schema: Schema }) {
  const fields = Object.entries(schema.properties ?? {});
  if (!fields.length) return <p className="muted">{typeWords(schema)}</p>;
  return (
    <table className="list">
      <thead><tr><th>Field</th><th>Type</th><th>Required</th><th>Meaning</th></tr></thead>
      <tbody>
        {fields.map(([name, field]) => (
          <tr key={name}>
            <td className="mono">{name}</td>
            <td>{typeWords(field)}{field.items?.properties && <SchemaFields schema={field.items} />}{field.properties && <SchemaFields schema={field} />}</td>
            <td>{schema.required?.includes(name) ? "yes" : "no"}</td>
            <td>{[field.description, limits(field)].filter(Boolean).join(" ")}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
export type { Schema };
