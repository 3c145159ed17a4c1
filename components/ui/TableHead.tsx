import type { ReactNode } from "react";
import { tableStyles } from "./styles";

export interface Column {
  label: ReactNode;
  /** e.g. "text-right" for numbers, a width. */
  className?: string;
  /** A column without a visible heading (row actions) still gets one for screen readers. */
  hiddenLabel?: boolean;
}

/** The header row of a plain (unsorted) table. */
export function TableHead({ columns }: { columns: Column[] }) {
  return (
    <thead>
      <tr>
        {columns.map((column, i) => (
          <th key={i} scope="col" className={`${tableStyles.head} ${column.className ?? ""}`}>
            {column.hiddenLabel ? <span className="sr-only">{column.label}</span> : column.label}
          </th>
        ))}
      </tr>
    </thead>
  );
}
