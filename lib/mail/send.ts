// Outgoing mail: nodemailer over plain SMTP to SMTP_HOST:SMTP_PORT (the local sink in demo and
// tests). The transport is built per message so tests can point SMTP_PORT at their own sink.
import nodemailer from "nodemailer";
import type { MailContent } from "./templates";

export const MAIL_FROM = process.env.MAIL_FROM ?? "Joulebook <no-reply@joulebook.test>";

export async function sendMail(args: { to: string } & MailContent): Promise<void> {
  const port = Number(process.env.SMTP_PORT ?? "2525");
  const transport = nodemailer.createTransport({
    host: process.env.SMTP_HOST ?? "127.0.0.1",
    port,
    secure: false,
    ignoreTLS: true, // loopback sink without TLS; a real relay would set SMTP_* differently
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
  });
  try {
    await transport.sendMail({ from: MAIL_FROM, to: args.to, subject: args.subject, text: args.text, html: args.html });
  } finally {
    transport.close();
  }
}

/** Sends and reports failure in the log instead of throwing: a mail problem must not undo the action. */
export async function trySendMail(args: { to: string } & MailContent): Promise<boolean> {
  try {
    await sendMail(args);
    return true;
  } catch (error) {
    console.error(`[joulebook] could not send "${args.subject}" to ${args.to}:`, error);
    return false;
  }
}
