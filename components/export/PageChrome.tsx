"use client";

/**
 * The site's header and page column around every page, except embeds (/embed/…): those are framed by someone
 * else's page (a talk's slides, a web page) and show the figure alone, edge to edge.
 */
import { useSelectedLayoutSegment } from "next/navigation";
import type { ReactNode } from "react";

export function PageChrome({ header, children }: { header: ReactNode; children: ReactNode }) {
  const segment = useSelectedLayoutSegment();
  if (segment === "embed") return <>{children}</>;
  return (
    <>
      {header}
      <main className="mx-auto w-full max-w-6xl px-4 py-8 sm:px-6">{children}</main>
    </>
  );
}
