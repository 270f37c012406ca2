// Per-user e-mail settings. No row = every kind on (the default a new account gets).
import { eq, sql } from "drizzle-orm";
import { getDb } from "./pool";
import { notificationSettings } from "./schema";

export const NOTIFICATION_KINDS = ["reviewRequests", "mentions", "verdicts"] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];
export type NotificationSettings = Record<NotificationKind, boolean>;

export const DEFAULT_NOTIFICATIONS: NotificationSettings = { reviewRequests: true, mentions: true, verdicts: true };

export async function getNotificationSettings(args: { userId: string }): Promise<NotificationSettings> {
  const rows = await getDb()
    .select({ reviewRequests: notificationSettings.reviewRequests, mentions: notificationSettings.mentions, verdicts: notificationSettings.verdicts })
    .from(notificationSettings)
    .where(eq(notificationSettings.userId, args.userId))
    .limit(1);
  return rows[0] ?? { ...DEFAULT_NOTIFICATIONS };
}

export async function saveNotificationSettings(args: { userId: string; settings: NotificationSettings }): Promise<NotificationSettings> {
  const values = { ...args.settings };
  await getDb()
    .insert(notificationSettings)
    .values({ userId: args.userId, ...values })
    .onConflictDoUpdate({ target: notificationSettings.userId, set: { ...values, updatedAt: sql`now()` } });
  return values;
}
