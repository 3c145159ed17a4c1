"use client";

import type { SortKey } from "./useScenarioListParams";
import { tableStyles } from "@/components/ui/styles";

interface SortableHeaderProps {
  label: string;
  sortKey: SortKey;
  current: { sort: SortKey; order: "asc" | "desc" };
  /** The order a first click sorts by: A→Z for words, newest first for times. */
  firstOrder: "asc" | "desc";
  onSort: (sort: SortKey, order: "asc" | "desc") => void;
  className?: string;
}

export function SortableHeader({ label, sortKey, current, firstOrder, onSort, className = "" }: SortableHeaderProps) {
  const active = current.sort === sortKey;
  const nextOrder = active ? (current.order === "asc" ? "desc" : "asc") : firstOrder;
  return (
    <th scope="col" aria-sort={active ? (current.order === "asc" ? "ascending" : "descending") : "none"} className={`${tableStyles.head} ${className}`}>
      <button
        type="button"
        onClick={() => onSort(sortKey, nextOrder)}
        className={`inline-flex items-center gap-1 uppercase tracking-wide hover:text-ink ${active ? "text-ink" : ""}`}
      >
        {label}
        <span aria-hidden="true" className={`font-mono text-[0.7rem] ${active ? "" : "opacity-30"}`}>
          {active ? (current.order === "asc" ? "▲" : "▼") : "▲▼"}
        </span>
      </button>
    </th>
  );
}
