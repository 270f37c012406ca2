import type { Metadata } from "next";
import { requireUser } from "@/lib/auth/server";
import { NameForm } from "@/components/account/name-form";
import { PasswordForm } from "@/components/account/password-form";
import { SignOutButton } from "@/components/shell/sign-out-button";
import { UserPage } from "@/components/shell/user-page";
import { Panel } from "@/components/ui/panel";
import { PageTitle } from "@/components/ui/page-title";
import { NotificationSettingsForm } from "@/components/reviews/notification-settings";
import { getNotificationSettings } from "@/db/notifications";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage() {
  const { user } = await requireUser();
  return (
    <UserPage>
      <PageTitle title="Account">
        <p>
          Signed in as <span className="font-medium">{user.email}</span>.
        </p>
      </PageTitle>
      <div className="grid max-w-3xl gap-gutter">
        <Panel title="Your name" description="Shown to colleagues next to your comments, versions and reviews.">
          <NameForm name={user.name} />
        </Panel>
        <Panel title="Password">
          <PasswordForm />
        </Panel>
        <Panel title="E-mail notifications" description="Design reviews: which e-mails you want. Links in them lead back to the version, comparison or review.">
          <NotificationSettingsForm initial={await getNotificationSettings({ userId: user.id })} />
        </Panel>
        <Panel title="API tokens" description="Personal tokens for scripts and the evaluate API: scoped to one workspace, shown once, revocable.">
          <a className="text-sm underline" href="/account/tokens">Manage API tokens</a>
        </Panel>
        <Panel title="Sign out" description="Ends this session in this browser.">
          <SignOutButton variant="secondary" />
        </Panel>
      </div>
    </UserPage>
  );
}
