import { desc } from "drizzle-orm";
import { getDb } from "./pool";
import { outboxMessages } from "./schema";

export type OutboxMessage = typeof outboxMessages.$inferSelect;

export async function insertOutboxMessage(args: Omit<OutboxMessage, "id" | "receivedAt">): Promise<void> {
  await getDb().insert(outboxMessages).values(args);
}

export async function listOutboxMessages(args: { limit?: number } = {}): Promise<OutboxMessage[]> {
  return getDb()
    .select()
    .from(outboxMessages)
    .orderBy(desc(outboxMessages.receivedAt))
    .limit(args.limit ?? 100);
}
