import { sentence } from "@/components/format/text";
import { Notice } from "@/components/ui/Notice";

/** The message above a form when the server refused it for more than a badly filled field. */
export function FormProblem({ problem }: { problem: string | null }) {
  return problem ? <Notice tone="invalid">{sentence(problem)}</Notice> : null;
}
