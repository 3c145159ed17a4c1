export default function EmbedLoading() {
  return <p className="p-4 text-sm text-ink-faint">Drawing the diagram…</p>;
}
