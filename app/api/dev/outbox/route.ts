import { listOutboxMessages } from "@/db/outbox";
import { NotFound } from "@/lib/http/errors";
import { json, route } from "@/lib/http/route";

// Development only: the mail the local sink received. Absent unless JOULEBOOK_OUTBOX=1.
export const GET = route({}, async () => {
  if (process.env.JOULEBOOK_OUTBOX !== "1") throw new NotFound();
  const rows = await listOutboxMessages({ limit: 100 });
  return json({
    messages: rows.map((m) => ({ id: m.id, to: m.to, from: m.from, subject: m.subject, text: m.text, html: m.html, receivedAt: m.receivedAt })),
  });
});
