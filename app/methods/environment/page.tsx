import { readFile } from "node:fs/promises";
import path from "node:path";
import type { Metadata } from "next";
import "katex/dist/katex.min.css";
import { MethodsDocument } from "@/components/methods/MethodsDocument";

export const metadata: Metadata = { title: "The lab's environment" };

export default async function EnvironmentMethodsPage() {
  const source = await readFile(path.join(process.cwd(), "docs/methods/environment.md"), "utf8");
  return <MethodsDocument source={source} backTo="/methods#environment" />;
}
