// The local fake SMTP server: accepts every message on 127.0.0.1:SMTP_PORT (no auth, no TLS,
// loopback only), parses it and stores it in outbox_messages for the development outbox page
// and for tests. Run: `node --import tsx server/mail-sink.ts`; tests use startMailSink().
import { simpleParser, type AddressObject } from "mailparser";
import { SMTPServer } from "smtp-server";
import { pathToFileURL } from "node:url";
import type { AddressInfo } from "node:net";
import { insertOutboxMessage } from "../db/outbox";
import { closeDb } from "../db/pool";

const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

function addressText(a: AddressObject | AddressObject[] | undefined): string {
  if (!a) return "";
  return (Array.isArray(a) ? a : [a]).map((x) => x.text).join(", ");
}

async function store(raw: Buffer, envelopeTo: string[]): Promise<void> {
  const parsed = await simpleParser(raw);
  await insertOutboxMessage({
    to: envelopeTo.length > 0 ? envelopeTo.join(", ") : addressText(parsed.to),
    from: addressText(parsed.from),
    subject: parsed.subject ?? "",
    text: parsed.text ?? "",
    html: typeof parsed.html === "string" ? parsed.html : null,
    raw: raw.toString("utf8"),
  });
}

export type MailSink = { port: number; close(): Promise<void> };

export function startMailSink(args: { port: number; host?: string }): Promise<MailSink> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["AUTH", "STARTTLS"],
    size: MAX_MESSAGE_BYTES,
    banner: "Joulebook local mail sink",
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", () => {
        if (stream.sizeExceeded) return callback(Object.assign(new Error("message too large"), { responseCode: 552 }));
        store(Buffer.concat(chunks), session.envelope.rcptTo.map((r) => r.address)).then(
          () => callback(),
          (error: unknown) => {
            console.error("[mail-sink] could not store a message:", error);
            callback(Object.assign(new Error("could not store the message"), { responseCode: 451 }));
          },
        );
      });
    },
  });
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    // Loopback only, whatever host is asked for: this sink must never face a network.
    const host = args.host === "::1" ? "::1" : "127.0.0.1";
    const net = server.listen(args.port, host, () => {
      server.off("error", reject);
      server.on("error", (e) => console.error("[mail-sink]", e));
      const port = (net.address() as AddressInfo).port;
      resolve({ port, close: () => new Promise<void>((done) => server.close(() => done())) });
    });
  });
}

async function main(): Promise<void> {
  const port = Number(process.env.SMTP_PORT ?? "2525");
  if (!Number.isInteger(port) || port <= 0) throw new Error(`SMTP_PORT must be a port number, got "${process.env.SMTP_PORT}"`);
  const sink = await startMailSink({ port });
  console.error(`[mail-sink] listening on 127.0.0.1:${sink.port}`);
  const stop = async () => {
    await sink.close();
    await closeDb();
    process.exit(0);
  };
  process.on("SIGTERM", () => void stop());
  process.on("SIGINT", () => void stop());
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main().catch((error: unknown) => {
    console.error("[mail-sink] failed to start:", error);
    process.exit(1);
  });
}
