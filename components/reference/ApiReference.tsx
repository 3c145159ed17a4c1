/**
 * The API reference, drawn from the OpenAPI document itself (lib/openapi.ts): per group, each operation's method
 * and path, who may call it, its parameters, the fields of its JSON body with their limits, and its answer.
 * A server component: plain HTML, no script. The page hands it the document and the operations table, so this
 * piece of UI depends on their shape only.
 */

/** One row of the operations table (lib/openapi.ts), as this reference shows it. */
export interface ReferencedOperation {
  method: string;
  path: string;
  tag: string;
  summary: string;
  access: string;
  success: { status: number; description: string };
}

type Schema = {
  type?: string | string[];
  enum?: unknown[];
  properties?: Record<string, Schema>;
  required?: string[];
  minLength?: number;
  maxLength?: number;
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  format?: string;
  oneOf?: Schema[];
  anyOf?: Schema[];
  items?: Schema;
  description?: string;
};

function typeText(schema: Schema): string {
  if (schema.enum) return schema.enum.map((v) => JSON.stringify(v)).join(" | ");
  if (schema.oneOf || schema.anyOf) return (schema.oneOf ?? schema.anyOf)!.map(typeText).join(" | ");
  if (schema.type === "array") return `array of ${schema.items ? typeText(schema.items) : "values"}`;
  const type = Array.isArray(schema.type) ? schema.type.join(" | ") : (schema.type ?? "any JSON");
  return schema.format ? `${type} (${schema.format})` : type;
}

function limits(schema: Schema): string {
  const parts: string[] = [];
  if (schema.minLength !== undefined) parts.push(`at least ${schema.minLength} characters`);
  if (schema.maxLength !== undefined) parts.push(`at most ${schema.maxLength} characters`);
  if (schema.exclusiveMinimum !== undefined) parts.push(`> ${schema.exclusiveMinimum}`);
  if (schema.minimum !== undefined) parts.push(`≥ ${schema.minimum}`);
  if (schema.maximum !== undefined) parts.push(`≤ ${schema.maximum}`);
  return parts.join(", ");
}

function Fields({ schema }: { schema: Schema }) {
  const properties = Object.entries(schema.properties ?? {});
  if (properties.length === 0) return <p className="text-sm text-ink-soft">{typeText(schema)}</p>;
  return (
    <table className="mt-1 w-full text-left text-sm">
      <tbody>
        {properties.map(([name, field]) => (
          <tr key={name} className="border-b border-rule align-top">
            <td className="py-1 pr-4 font-mono">
              {name}
              {schema.required?.includes(name) ? "" : "?"}
            </td>
            <td className="py-1 pr-4 break-words">{typeText(field)}</td>
            <td className="py-1 text-ink-soft">{[limits(field), field.description].filter(Boolean).join("; ")}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function ApiReference({ document, operations }: { document: { paths?: Record<string, unknown> }; operations: readonly ReferencedOperation[] }) {
  const tags = [...new Set(operations.map((op) => op.tag))];
  return (
    <div className="space-y-12">
      {tags.map((tag) => (
        <section key={tag} aria-labelledby={`api-${tag}`}>
          <h2 id={`api-${tag}`} className="mb-4 font-serif text-2xl font-semibold">
            {tag}
          </h2>
          <div className="space-y-6">
            {operations
              .filter((op) => op.tag === tag)
              .map((op) => {
                const described = (document.paths?.[op.path] as Record<string, { requestBody?: { content: Record<string, { schema: Schema }> }; parameters?: { name: string; in: string; schema: Schema }[] }>)[op.method];
                const body = described.requestBody?.content["application/json"]?.schema;
                const query = (described.parameters ?? []).filter((p) => p.in === "query");
                return (
                  <article key={`${op.method} ${op.path}`} className="border-l-2 border-rule pl-4">
                    <h3 className="font-mono text-sm break-all">
                      <span className="mr-2 font-semibold uppercase">{op.method}</span>
                      {op.path}
                    </h3>
                    <p className="mt-1">{op.summary}.</p>
                    <p className="text-sm text-ink-soft">
                      Who may call it: {op.access}. Answers {op.success.status}: {op.success.description.toLowerCase()}.
                    </p>
                    {query.length > 0 && (
                      <div className="mt-2">
                        <h4 className="text-sm font-semibold">Query</h4>
                        <Fields schema={{ type: "object", properties: Object.fromEntries(query.map((p) => [p.name, p.schema])) }} />
                      </div>
                    )}
                    {body && (
                      <div className="mt-2">
                        <h4 className="text-sm font-semibold">JSON body</h4>
                        <Fields schema={body} />
                      </div>
                    )}
                  </article>
                );
              })}
          </div>
        </section>
      ))}
    </div>
  );
}
