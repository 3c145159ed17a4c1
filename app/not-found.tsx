import { NotFoundNotice } from "@/components/ui/NotFoundNotice";

export default function NotFound() {
  return <NotFoundNotice />;
}
