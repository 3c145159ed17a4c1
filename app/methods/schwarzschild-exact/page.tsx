import { readFile } from "node:fs/promises";
import path from "node:path";
import type { Metadata } from "next";
import "katex/dist/katex.min.css";
import { MethodsDocument } from "@/components/methods/MethodsDocument";
import { RatioPlot } from "@/components/methods/RatioPlot";
import { ratioCurve } from "@/physics/horizon/schwarzschild-exact";

export const metadata: Metadata = { title: "Exact Schwarzschild horizon rate" };

const heights = Array.from({ length: 121 }, (_, i) => 10 ** (-6 + (i * 10) / 120));

export default async function SchwarzschildExactPage() {
  const source = await readFile(path.join(process.cwd(), "docs/methods/schwarzschild-exact.md"), "utf8");
  const points = ratioCurve(heights.map((h) => 2 + h)).map((p, i) => ({ heightOverM: heights[i], radial: p.radial, tangential: p.tangential }));
  return (
    <MethodsDocument source={source} backTo="/methods#schwarzschild">
      <RatioPlot points={points} />
    </MethodsDocument>
  );
}
