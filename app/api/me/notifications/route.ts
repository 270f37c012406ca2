// GET / PUT the signed-in user's e-mail settings for review requests, mentions and verdicts.
import { getNotificationSettings, saveNotificationSettings } from "@/db/notifications";
import { json, route } from "@/lib/http/route";
import { notificationSettingsSchema } from "@/lib/versions/schemas";

export const GET = route({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  return json({ settings: await getNotificationSettings({ userId: user.id }) });
});

export const PUT = route<Record<string, never>, typeof notificationSettingsSchema>({ body: notificationSettingsSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  return json({ settings: await saveNotificationSettings({ userId: user.id, settings: body }) });
});
