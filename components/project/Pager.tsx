"use client";

import { buttonStyles } from "@/components/ui/styles";

interface PagerProps {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
}

export function Pager({ page, pageSize, total, onPage }: PagerProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav aria-label="Pages of scenarios" className="flex flex-wrap items-center justify-between gap-4 py-4 text-sm text-ink-soft">
      <p>
        <span className="tabular">
          {first}–{last}
        </span>{" "}
        of <span className="tabular">{total}</span> {total === 1 ? "scenario" : "scenarios"}
      </p>
      {pages > 1 && (
        <div className="flex items-center gap-3">
          <button type="button" disabled={page <= 1} onClick={() => onPage(page - 1)} className={`${buttonStyles.secondary} py-1`}>
            ← Previous
          </button>
          <span>
            Page <span className="tabular">{page}</span> of <span className="tabular">{pages}</span>
          </span>
          <button type="button" disabled={page >= pages} onClick={() => onPage(page + 1)} className={`${buttonStyles.secondary} py-1`}>
            Next →
          </button>
        </div>
      )}
    </nav>
  );
}
