import { readFile } from "node:fs/promises";
import path from "node:path";
import type { Metadata } from "next";
import Link from "next/link";
import "katex/dist/katex.min.css";
import { MathMarkdown } from "@/components/methods/MathMarkdown";
import { RatioPlot } from "@/components/methods/RatioPlot";
import { ratioCurve } from "@/physics/horizon/schwarzschild-exact";

export const metadata: Metadata = { title: "Exact Schwarzschild horizon rate" };

const heights = Array.from({ length: 121 }, (_, i) => 10 ** (-6 + (i * 10) / 120));

export default async function SchwarzschildExactPage() {
  const source = await readFile(path.join(process.cwd(), "docs/methods/schwarzschild-exact.md"), "utf8");
  const [title, ...rest] = source.split("\n");
  const points = ratioCurve(heights.map((h) => 2 + h)).map((p, i) => ({ heightOverM: heights[i], radial: p.radial, tangential: p.tangential }));
  return (
    <div className="mx-auto max-w-3xl">
      <p className="text-sm">
        <Link href="/methods#schwarzschild" className="text-branchB hover:underline">
          ← Methods
        </Link>
      </p>
      <h1 className="mt-2 font-serif text-4xl font-semibold tracking-tight">{title.replace(/^#\s*/, "")}</h1>
      <RatioPlot points={points} />
      <MathMarkdown source={rest.join("\n")} />
    </div>
  );
}
