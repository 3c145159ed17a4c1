/** A dead embed: plain words in the frame, without the site around them. */
export default function EmbedNotFound() {
  return (
    <div className="flex h-screen items-center justify-center p-6 text-center text-sm text-ink-soft">
      <p>This figure is no longer shared: its link was not found, or it has expired or been revoked.</p>
    </div>
  );
}
