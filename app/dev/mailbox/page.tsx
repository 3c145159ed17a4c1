import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { mailboxUrlFor } from "@/lib/dev-mailbox";
import type { MailboxMessage } from "@/lib/mailbox";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "Development mailbox" };
export const dynamic = "force-dynamic";

/**
 * The messages the local fake SMTP server received, for the demo and for development. Exists only for a signed-in
 * site administrator, on a server whose public URL is loopback and for a request that came over loopback, when
 * BRANCHLINE_MAILBOX_URL points at the fake's mailbox API (the demo and test scripts set it); otherwise 404.
 */
export default async function MailboxPage() {
  const base = mailboxUrlFor(await currentUser());
  if (!base) notFound();
  let messages: MailboxMessage[] = [];
  let problem: string | null = null;
  try {
    const res = await fetch(`${base.replace(/\/$/, "")}/messages`, { cache: "no-store" });
    messages = ((await res.json()) as { messages: MailboxMessage[] }).messages;
  } catch {
    problem = `the fake SMTP server's mailbox at ${base} does not answer; start it with scripts/services.sh start`;
  }
  return (
    <section>
      <h1 className="font-serif text-3xl font-semibold">Development mailbox</h1>
      <p className="mt-2 text-ink-soft">
        Messages Branchline sent through the local fake SMTP server. This page does not exist in production.
      </p>
      {problem && <p className="mt-6 text-invalid">⚠ {problem}</p>}
      {!problem && messages.length === 0 && <p className="mt-6 text-ink-soft">No messages yet.</p>}
      <ol className="mt-6 space-y-4">
        {messages.map((m) => (
          <li key={m.id} className="rounded border border-rule bg-white/60 p-4" data-testid="mail-message">
            <div className="flex flex-wrap gap-x-6 text-sm text-ink-soft">
              <span>To: {m.to.join(", ")}</span>
              <span className="tabular">{new Date(m.receivedAt).toISOString().replace("T", " ").slice(0, 19)} UTC</span>
            </div>
            <h2 className="mt-1 font-semibold">{m.subject}</h2>
            <pre className="mt-2 whitespace-pre-wrap break-all font-sans text-sm">
              {m.text.split(/(https?:\/\/\S+)/g).map((part, i) =>
                /^https?:\/\//.test(part) ? (
                  <a key={i} href={part} className="text-branchB underline">
                    {part}
                  </a>
                ) : (
                  part
                ),
              )}
            </pre>
          </li>
        ))}
      </ol>
    </section>
  );
}
