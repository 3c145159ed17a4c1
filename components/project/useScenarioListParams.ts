"use client";

import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useCallback, useMemo } from "react";
import type { ScenarioListQuery } from "@/components/api/scenarios";
import { scenarioListQuerySchema } from "@/contracts/requests";

export const PAGE_SIZE = 25;
export type SortKey = ScenarioListQuery["sort"];

const shape = scenarioListQuerySchema.shape;

/** Reads one search parameter with the API's own schema; anything it would reject counts as absent. */
function read<T>(schema: { safeParse: (value: unknown) => { success: true; data: T } | { success: false } }, value: string | null): T | undefined {
  const parsed = schema.safeParse(value ?? undefined);
  return parsed.success ? parsed.data : undefined;
}

/**
 * The scenario table's sort, filters and page live in the address (?sort=&order=&q=&background=&page=), so a
 * reload, a shared link or the back button shows the same rows.
 */
export function useScenarioListParams(): [ScenarioListQuery, (patch: Partial<Omit<ScenarioListQuery, "pageSize">>) => void] {
  const params = useSearchParams();
  const router = useRouter();
  const pathname = usePathname();

  const query = useMemo<ScenarioListQuery>(() => {
    return {
      page: read(shape.page, params.get("page")) ?? 1,
      pageSize: PAGE_SIZE,
      sort: read(shape.sort, params.get("sort")) ?? "updatedAt",
      order: read(shape.order, params.get("order")) ?? "desc",
      q: read(shape.q, params.get("q")) || undefined,
      background: read(shape.background, params.get("background")),
    };
  }, [params]);

  const update = useCallback(
    (patch: Partial<Omit<ScenarioListQuery, "pageSize">>) => {
      const next = { ...query, ...patch };
      // Narrowing or re-sorting the rows starts again at the first page.
      if (!("page" in patch)) next.page = 1;
      const search = new URLSearchParams();
      if (next.sort !== "updatedAt" || next.order !== "desc") {
        search.set("sort", next.sort);
        search.set("order", next.order);
      }
      if (next.q) search.set("q", next.q);
      if (next.background) search.set("background", next.background);
      if (next.page > 1) search.set("page", String(next.page));
      const qs = search.toString();
      router.replace(qs ? `${pathname}?${qs}` : pathname, { scroll: false });
    },
    [query, router, pathname],
  );

  return [query, update];
}
