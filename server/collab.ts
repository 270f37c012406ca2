// The collaboration server process (started by scripts/services.sh):
//   COLLAB_PORT=3211 APP_URL=http://127.0.0.1:3210 DATABASE_URL=… node --import tsx server/collab.ts
// Optional: COLLAB_COMPACT_THRESHOLD (update rows per document before compaction, default 500).
import { closeDb } from "@/db/pool";
import { startCollabServer } from "./collab/server";

function numberFromEnv(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value <= 0) throw new Error(`${name} must be a positive whole number, got "${raw}"`);
  return value;
}

async function main(): Promise<void> {
  const port = numberFromEnv("COLLAB_PORT", 3211);
  const appUrl = process.env.APP_URL;
  if (!appUrl) throw new Error("APP_URL is not set: the collaboration server accepts only upgrades whose Origin is the app's");
  if (!process.env.DATABASE_URL) throw new Error("DATABASE_URL is not set");
  const server = await startCollabServer({ port, appUrl, compactThreshold: numberFromEnv("COLLAB_COMPACT_THRESHOLD", 500) });
  console.error(`[collab] listening on 127.0.0.1:${server.port}, accepting Origin ${new URL(appUrl).origin}`);
  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    await server.close();
    await closeDb();
    process.exit(0);
  };
  process.on("SIGTERM", () => void stop());
  process.on("SIGINT", () => void stop());
}

main().catch((error: unknown) => {
  console.error("[collab]", error instanceof Error ? error.message : error);
  process.exit(1);
});
