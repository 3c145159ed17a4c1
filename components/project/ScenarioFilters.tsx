"use client";

import { useEffect, useId, useRef, useState } from "react";
import type { ScenarioListQuery } from "@/components/api/scenarios";
import { backgroundKinds, backgroundNames } from "@/components/format/words";
import { buttonStyles, fieldStyles } from "@/components/ui/styles";

const TYPING_PAUSE_MS = 300;

interface ScenarioFiltersProps {
  query: ScenarioListQuery;
  onChange: (patch: Pick<Partial<ScenarioListQuery>, "q" | "background">) => void;
}

export function ScenarioFilters({ query, onChange }: ScenarioFiltersProps) {
  const titleId = useId();
  const backgroundId = useId();
  const [text, setText] = useState(query.q ?? "");
  const sent = useRef(query.q);

  // The address is the source of truth: follow it when it changes from elsewhere (back button, a shared link),
  // but not when it merely catches up with what is being typed.
  useEffect(() => {
    if (query.q !== sent.current) {
      sent.current = query.q;
      setText(query.q ?? "");
    }
  }, [query.q]);

  useEffect(() => {
    const wanted = text.trim() || undefined;
    if (wanted === sent.current) return;
    const timer = setTimeout(() => {
      sent.current = wanted;
      onChange({ q: wanted });
    }, TYPING_PAUSE_MS);
    return () => clearTimeout(timer);
  }, [text, onChange]);

  const filtered = Boolean(query.q || query.background);

  return (
    <div role="search" aria-label="Filter scenarios" className="flex flex-wrap items-end gap-4">
      <div className="w-64">
        <label htmlFor={titleId} className={fieldStyles.label}>
          Search
        </label>
        <input id={titleId} type="search" value={text} onChange={(e) => setText(e.target.value)} placeholder="words in a title" className={fieldStyles.control} />
      </div>
      <div className="w-56">
        <label htmlFor={backgroundId} className={fieldStyles.label}>
          Show
        </label>
        <select
          id={backgroundId}
          value={query.background ?? ""}
          onChange={(e) => onChange({ background: (e.target.value || undefined) as ScenarioListQuery["background"] })}
          className={fieldStyles.control}
        >
          <option value="">All backgrounds</option>
          {backgroundKinds.map((kind) => (
            <option key={kind} value={kind}>
              {backgroundNames[kind]}
            </option>
          ))}
        </select>
      </div>
      {filtered && (
        <button
          type="button"
          onClick={() => {
            setText("");
            sent.current = undefined;
            onChange({ q: undefined, background: undefined });
          }}
          className={buttonStyles.secondary}
        >
          Clear filters
        </button>
      )}
    </div>
  );
}
