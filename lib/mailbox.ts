/**
 * The fake SMTP server's mailbox API (scripts/smtp-fake.ts), for the development mailbox page and the tests:
 *   GET    /messages        newest first: { messages: MailboxMessage[] }
 *   DELETE /messages        forget them all
 */
export interface MailboxMessage {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
}
