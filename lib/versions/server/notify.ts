// Sends review e-mails to members who have that kind switched on. A failed send is logged and
// never undoes the action that caused it.
import { getNotificationSettings, type NotificationKind } from "@/db/notifications";
import { trySendMail } from "@/lib/mail/send";
import type { MailContent } from "@/lib/mail/templates";

export async function notify(args: { to: { userId: string; email: string }[]; kind: NotificationKind; mail: MailContent }): Promise<number> {
  let sent = 0;
  for (const person of args.to) {
    const settings = await getNotificationSettings({ userId: person.userId });
    if (!settings[args.kind]) continue;
    if (await trySendMail({ to: person.email, ...args.mail })) sent++;
  }
  return sent;
}
