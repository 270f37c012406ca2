import Link from "next/link";
import { LogoMark } from "@/components/brand/logo-mark";
import { MainNav } from "./main-nav";
import { SignOutButton } from "./sign-out-button";
import { WorkspaceSwitcher } from "./workspace-switcher";

type Props = {
  user: { name: string; email: string };
  workspaces: { id: string; name: string; role: string }[];
  currentWorkspaceId?: string;
};

export function AppHeader({ user, workspaces, currentWorkspaceId }: Props) {
  const items = currentWorkspaceId
    ? [
        { href: `/w/${currentWorkspaceId}`, label: "Overview", exact: true },
        { href: `/w/${currentWorkspaceId}/documents`, label: "Documents" },
        { href: `/w/${currentWorkspaceId}/library`, label: "Library" },
        { href: `/w/${currentWorkspaceId}/members`, label: "Members" },
        { href: "/account", label: "Account" },
      ]
    : [{ href: "/account", label: "Account" }];
  return (
    <header className="border-b border-rule bg-paper-raised/70">
      <div className="mx-auto flex max-w-page flex-wrap items-center gap-x-5 gap-y-3 px-gutter py-3">
        <Link href="/" className="inline-flex items-center gap-2 rounded-control font-semibold tracking-tight">
          <LogoMark size={26} />
          <span>Joulebook</span>
        </Link>
        <WorkspaceSwitcher workspaces={workspaces} currentId={currentWorkspaceId} />
        <MainNav items={items} />
        <div className="ml-auto flex items-center gap-3">
          <p className="hidden text-right text-sm leading-tight sm:block">
            <span className="block font-medium">{user.name}</span>
            <span className="block text-xs text-muted">{user.email}</span>
          </p>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
