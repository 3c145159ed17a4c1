"use client";

import { ApiError, messageOf } from "@/components/api/client";
import { sentence } from "@/components/format/text";
import { Notice } from "@/components/ui/Notice";

/** Why a file was refused: the server's message, then each problem it listed (with its path or row), all of them. */
export function ProblemList({ error, title }: { error: unknown; title?: string }) {
  const fields = error instanceof ApiError ? error.fields : [];
  return (
    <Notice tone="invalid">
      <p className="font-semibold">{title ?? sentence(messageOf(error))}</p>
      {title && <p>{sentence(messageOf(error))}</p>}
      {fields.length > 0 && (
        <ul className="mt-2 max-h-64 list-none space-y-1 overflow-y-auto pr-2" aria-label="Problems found">
          {fields.map((f, i) => (
            <li key={`${f.path}-${i}`} className="flex gap-2">
              {f.path && !f.message.startsWith(f.path) && <code className="shrink-0 font-mono text-xs leading-5">{f.path}</code>}
              <span>{sentence(f.message)}</span>
            </li>
          ))}
        </ul>
      )}
    </Notice>
  );
}
