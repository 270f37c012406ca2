// Mail end to end through the real sink process: nodemailer → SMTP → server/mail-sink.ts →
// mailparser → outbox_messages, read back from the database and through GET /api/dev/outbox.
import { spawn, type ChildProcess } from "node:child_process";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as outboxRoute from "@/app/api/dev/outbox/route";
import { listOutboxMessages } from "@/db/outbox";
import { sendMail } from "@/lib/mail/send";
import { invitationMail } from "@/lib/mail/templates";
import { bodyOf, call } from "./support/http";
import { freePort } from "./support/ports";

let sink: ChildProcess | undefined;

beforeAll(async () => {
  const port = await freePort();
  process.env.SMTP_HOST = "127.0.0.1";
  process.env.SMTP_PORT = String(port);
  sink = spawn(process.execPath, ["--import", "tsx", "server/mail-sink.ts"], {
    env: { ...process.env, SMTP_PORT: String(port) },
    stdio: ["ignore", "ignore", "pipe"],
  });
  let log = "";
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`mail sink did not start:\n${log}`)), 20_000);
    sink!.stderr!.on("data", (d: Buffer) => {
      log += d.toString();
      if (log.includes("listening on")) {
        clearTimeout(timer);
        resolve();
      }
    });
    sink!.once("exit", (code) => reject(new Error(`mail sink exited with ${code}:\n${log}`)));
  });
});

afterAll(async () => {
  if (sink && sink.exitCode === null) {
    const exited = new Promise((r) => sink!.once("exit", r));
    sink.kill("SIGTERM");
    await exited;
  }
});

async function waitForMail(to: string) {
  for (let i = 0; i < 50; i++) {
    const found = (await listOutboxMessages()).find((m) => m.to === to);
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${to}`);
}

describe("mail sink process", () => {
  it("stores what nodemailer sent: recipients, subject, text, HTML and the raw message", async () => {
    const link = "http://127.0.0.1:3210/invite/" + "T".repeat(43);
    const mail = invitationMail({ workspaceName: "Cargo <Bike> & Co", inviterName: "Ada", role: "viewer", link, expiresAt: new Date("2030-01-08T00:00:00Z") });
    await sendMail({ to: "outbox-reader@example.com", ...mail });
    const m = await waitForMail("outbox-reader@example.com");
    expect(m.subject).toBe('Join "Cargo <Bike> & Co" on Joulebook');
    expect(m.from).toMatch(/no-reply@joulebook\.test/);
    expect(m.text).toContain(link);
    expect(m.text).toContain("until 2030-01-08");
    expect(m.html).toContain(`href="${link}"`);
    expect(m.html).toContain("Cargo &lt;Bike&gt; &amp; Co"); // names are escaped in the HTML part
    expect(m.raw).toMatch(/^Content-Type: multipart\/alternative/m);
  });

  it("GET /api/dev/outbox lists the messages only when JOULEBOOK_OUTBOX=1", async () => {
    await sendMail({ to: "dev-outbox@example.com", subject: "Hello outbox", text: "plain body", html: "<p>html body</p>" });
    await waitForMail("dev-outbox@example.com");
    delete process.env.JOULEBOOK_OUTBOX;
    expect((await call(outboxRoute.GET, "GET", "/api/dev/outbox")).status).toBe(404);
    process.env.JOULEBOOK_OUTBOX = "1";
    const res = await call(outboxRoute.GET, "GET", "/api/dev/outbox");
    expect(res.status).toBe(200);
    const { messages } = await bodyOf(res);
    const m = messages.find((x: { to: string }) => x.to === "dev-outbox@example.com");
    expect(m).toMatchObject({ subject: "Hello outbox", text: "plain body", html: "<p>html body</p>" });
    expect(typeof m.receivedAt).toBe("string");
  });
});
