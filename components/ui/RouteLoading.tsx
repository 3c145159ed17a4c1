/** What a route shows while its server part is still on its way. */
export function RouteLoading({ label = "Loading" }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="py-16">
      <span className="sr-only">{label}…</span>
      <div aria-hidden="true" className="space-y-4">
        <div className="h-8 w-1/3 animate-pulse rounded-sm bg-paper-deep" />
        <div className="h-px w-full bg-rule" />
        <div className="h-4 w-2/3 animate-pulse rounded-sm bg-paper-deep" />
        <div className="h-4 w-1/2 animate-pulse rounded-sm bg-paper-deep" />
      </div>
    </div>
  );
}
