// Starts the mail sink in the test process on a free loopback port and points SMTP_PORT at it,
// so mail sent by the handlers lands in this test file's own outbox_messages.
import { afterAll, beforeAll } from "vitest";
import { listOutboxMessages } from "@/db/outbox";
import { startMailSink, type MailSink } from "@/server/mail-sink";

export function useMailSink(): void {
  let sink: MailSink | undefined;
  beforeAll(async () => {
    sink = await startMailSink({ port: 0 });
    process.env.SMTP_HOST = "127.0.0.1";
    process.env.SMTP_PORT = String(sink.port);
  });
  afterAll(async () => {
    await sink?.close();
  });
}

/** The newest message to `to`, or throws. */
export async function lastMailTo(to: string) {
  const found = (await listOutboxMessages({ limit: 500 })).find((m) => m.to.includes(to));
  if (!found) throw new Error(`no mail to ${to} in the outbox`);
  return found;
}

export function linkToken(text: string, pathPrefix: string): string {
  const m = new RegExp(`${pathPrefix.replace(/[?/]/g, (c) => `\\${c}`)}([A-Za-z0-9_-]{43})`).exec(text);
  if (!m?.[1]) throw new Error(`no ${pathPrefix} link in:\n${text}`);
  return m[1];
}
