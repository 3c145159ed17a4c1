import type { Metadata } from "next";
import { ApiReference } from "@/components/reference/ApiReference";
import { PageHeader } from "@/components/ui/PageHeader";
import { linkStyles } from "@/components/ui/styles";
import { openApiDocument, operations } from "@/lib/openapi";

export const metadata: Metadata = { title: "API reference" };

export default function ApiReferencePage() {
  return (
    <>
      <PageHeader title="API reference">
        Every route of Branchline&apos;s JSON API, from the schemas the server enforces. The same as an OpenAPI 3.1 document:{" "}
        <a href="/api/openapi.json" className={linkStyles}>
          /api/openapi.json
        </a>
        . Errors always have the shape <code className="font-mono text-sm">{`{ "error": { "code", "message", "fields" } }`}</code>, with each
        field&apos;s document path.
      </PageHeader>
      <ApiReference document={openApiDocument()} operations={operations} />
    </>
  );
}
