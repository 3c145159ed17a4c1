/** Reads the fake SMTP server's mailbox API (scripts/smtp-fake.ts), which keeps every message it received. */
import type { MailboxMessage } from "@/lib/mailbox";

export type { MailboxMessage };

/** Every message to this address, newest first. */
export async function mailboxMessagesTo(address: string): Promise<MailboxMessage[]> {
  const res = await fetch(`${process.env.BRANCHLINE_MAILBOX_URL}/messages`);
  const { messages } = (await res.json()) as { messages: MailboxMessage[] };
  return messages.filter((m) => m.to.includes(address));
}
