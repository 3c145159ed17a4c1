import "server-only";
import nodemailer from "nodemailer";

/** SMTP settings: SMTP_URL (default: the local fake on 127.0.0.1:2525) and MAIL_FROM. */
export function smtpUrl(): string {
  return process.env.SMTP_URL ?? "smtp://127.0.0.1:2525";
}

export function mailFrom(): string {
  return process.env.MAIL_FROM ?? "Branchline <no-reply@branchline.invalid>";
}

const holder = globalThis as unknown as { branchlineMailer?: nodemailer.Transporter };

function transport(): nodemailer.Transporter {
  holder.branchlineMailer ??= nodemailer.createTransport(smtpUrl());
  return holder.branchlineMailer;
}

export interface Mail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export async function sendMail(mail: Mail): Promise<void> {
  await transport().sendMail({ from: mailFrom(), ...mail });
}

/**
 * Sends without making the caller wait, for answers that must take the same time whether or not a message goes
 * out (password reset, sign-up): the SMTP round trip would otherwise tell who has an account. A failure is
 * logged on the server; the person it was for is told nothing either way.
 */
export function sendMailInBackground(mail: Mail): void {
  sendMail(mail).catch((error: unknown) => console.error("[mail] could not send", mail.subject, error));
}

/** The application's public base URL, for links in e-mails. */
export function appUrl(): string {
  return (process.env.NEXTAUTH_URL ?? "http://localhost:3000").replace(/\/$/, "");
}
