"use client";

import { RouteError } from "@/components/ui/RouteError";

export default function RouteErrorPage(props: { error: Error & { digest?: string }; reset: () => void }) {
  return <RouteError {...props} />;
}
