import { readFile } from "node:fs/promises";
import path from "node:path";
import type { Metadata } from "next";
import Link from "next/link";
import "katex/dist/katex.min.css";
import { MathMarkdown } from "@/components/methods/MathMarkdown";

export const metadata: Metadata = { title: "The lab's environment" };

export default async function EnvironmentMethodsPage() {
  const source = await readFile(path.join(process.cwd(), "docs/methods/environment.md"), "utf8");
  const [title, ...rest] = source.split("\n");
  return (
    <div className="mx-auto max-w-3xl">
      <p className="text-sm">
        <Link href="/methods#environment" className="text-branchB hover:underline">
          ← Methods
        </Link>
      </p>
      <h1 className="mt-2 font-serif text-4xl font-semibold tracking-tight">{title.replace(/^#\s*/, "")}</h1>
      <MathMarkdown source={rest.join("\n")} />
    </div>
  );
}
