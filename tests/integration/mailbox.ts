/** Reads the fake SMTP server's mailbox API (scripts/smtp-fake.ts), which keeps every message it received. */
import type { MailboxMessage } from "@/lib/mailbox";

export type { MailboxMessage };

/** Every message to this address, newest first. */
export async function mailboxMessagesTo(address: string): Promise<MailboxMessage[]> {
  const res = await fetch(`${process.env.BRANCHLINE_MAILBOX_URL}/messages`);
  const { messages } = (await res.json()) as { messages: MailboxMessage[] };
  return messages.filter((m) => m.to.includes(address));
}

/** Every message to this address once at least one has arrived (mail that answers must not wait for goes out in the background). */
export async function waitForMailTo(address: string, timeoutMs = 10_000): Promise<MailboxMessage[]> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const messages = await mailboxMessagesTo(address);
    if (messages.length > 0 || Date.now() > deadline) return messages;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}
