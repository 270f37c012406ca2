// The onboarding path of issue 2, in a real browser against the built app:
// sign up → create a workspace → invite a reviewer → the reviewer follows the outbox link,
// signs up and accepts → sees the workspace and a read-only members page.
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { openPerson, screenshot, type Person } from "./support/browser";
import { ConsoleWatch } from "./support/console-watch";
import { fillSignUp, gotoApp, newAccount, pathOf } from "./support/flows";
import { linkFromOutbox } from "./support/outbox";

describe("onboarding: owner invites a reviewer", () => {
  let owner: Person;
  let reviewer: Person;
  let ownerConsole: ConsoleWatch;
  let reviewerConsole: ConsoleWatch;
  const ownerAccount = newAccount("Owner");
  const reviewerAccount = newAccount("Reviewer");
  const workspaceName = `PHEV concept ${Date.now().toString(36)}`;

  beforeAll(async () => {
    owner = await openPerson();
    reviewer = await openPerson();
    ownerConsole = new ConsoleWatch(owner.page);
    reviewerConsole = new ConsoleWatch(reviewer.page);
  });
  afterAll(async () => {
    await owner?.close();
    await reviewer?.close();
  });

  test("from sign-up to a read-only reviewer", async () => {
    const page = owner.page;

    // 1. A new person signs up; with no workspace yet they land on "New workspace".
    await gotoApp(page, "/sign-up");
    await screenshot(page, "01-sign-up");
    expect(ownerConsole.take()).toEqual([]);
    await fillSignUp(page, ownerAccount);
    await page.waitForURL("**/workspaces/new");
    await page.getByRole("heading", { level: 1, name: "New workspace" }).waitFor();
    await screenshot(page, "02-new-workspace");
    expect(ownerConsole.take()).toEqual([]);

    // 2. They create a workspace and become its owner.
    await page.getByLabel("Workspace name").fill(workspaceName);
    await page.getByRole("button", { name: "Create workspace" }).click();
    await page.waitForURL(/\/w\/[0-9a-f-]{36}$/);
    const workspacePath = pathOf(page);
    await page.getByRole("heading", { level: 1, name: workspaceName }).waitFor();
    expect(await page.locator("main").innerText()).toContain("owner");
    // A new workspace really has no documents: the overview says so (and shows no count).
    await page.getByText("No documents in this workspace yet.").waitFor();
    expect(await page.getByTestId("document-count").count()).toBe(0);
    await screenshot(page, "03-workspace-home-owner");
    expect(ownerConsole.take()).toEqual([]);

    // 3. On the members page they invite a reviewer by e-mail.
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Members" }).click();
    await page.waitForURL(`**${workspacePath}/members`);
    await page.getByRole("cell", { name: ownerAccount.email, exact: true }).waitFor();
    // The owner gets the controls that a reviewer will not: a role select in the table.
    expect(await page.getByRole("combobox", { name: `Role of ${ownerAccount.name}` }).count()).toBe(1);
    const inviteForm = page.getByRole("form", { name: "Invite a colleague" });
    await inviteForm.getByLabel("E-mail").fill(reviewerAccount.email);
    await inviteForm.getByLabel("Role").selectOption("reviewer");
    await inviteForm.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText(`Invitation sent to ${reviewerAccount.email}.`).waitFor();
    await page.getByRole("cell", { name: reviewerAccount.email, exact: true }).waitFor(); // listed as pending
    await screenshot(page, "04-members-owner-after-invite");
    await page.setViewportSize({ width: 390, height: 844 }); // a phone, to see the layout hold
    await screenshot(page, "04b-members-owner-narrow");
    await page.setViewportSize({ width: 1280, height: 860 });
    expect(ownerConsole.take()).toEqual([]);

    // 4. The development outbox shows the invitation e-mail with a clickable link.
    const href = await linkFromOutbox(page, reviewerAccount.email, "/invite/");
    expect(href).toMatch(/\/invite\/[A-Za-z0-9_-]{43}$/);
    await screenshot(page, "05-outbox");
    expect(ownerConsole.take()).toEqual([]);

    // 5. The reviewer, in their own browser profile, opens the link: signed out, they are asked
    //    to sign in or create an account first, and come back to the invitation afterwards.
    const invitePath = new URL(href).pathname;
    const rpage = reviewer.page;
    await gotoApp(rpage, invitePath);
    await rpage.getByText("Sign in or create an account first").waitFor();
    expect(await rpage.locator("main").innerText()).toContain(workspaceName);
    await screenshot(rpage, "06-invitation-signed-out");
    expect(reviewerConsole.take()).toEqual([]);

    await rpage.getByRole("link", { name: "Create an account" }).click();
    await rpage.waitForURL("**/sign-up?**");
    expect(await rpage.getByLabel("E-mail", { exact: true }).inputValue()).toBe(reviewerAccount.email);
    await fillSignUp(rpage, reviewerAccount);
    await rpage.waitForURL(`**${invitePath}`);

    // Before accepting they are not a member: the workspace answers "not found", revealing nothing.
    const before = await rpage.goto(new URL(workspacePath, rpage.url()).href);
    expect(before?.status()).toBe(404);
    await rpage.getByRole("heading", { name: "Nothing here" }).waitFor();
    expect(await rpage.locator("body").innerText()).not.toContain(workspaceName);
    await screenshot(rpage, "06b-workspace-not-member");
    expect(reviewerConsole.take().filter((e) => !e.includes("status of 404"))).toEqual([]);
    await gotoApp(rpage, invitePath);

    const accept = rpage.getByRole("button", { name: `Accept and open ${workspaceName}` });
    await accept.waitFor();
    await screenshot(rpage, "07-invitation-signed-in");
    expect(reviewerConsole.take()).toEqual([]);

    // 6. Accepting opens the workspace with the reviewer role.
    await accept.click();
    await rpage.waitForURL(`**${workspacePath}`);
    await rpage.getByRole("heading", { level: 1, name: workspaceName }).waitFor();
    expect(await rpage.locator("main").innerText()).toContain("reviewer");
    await screenshot(rpage, "08-workspace-home-reviewer");
    expect(reviewerConsole.take()).toEqual([]);

    // The workspace switcher works from the keyboard: ArrowDown opens it, Escape closes it.
    const switcher = rpage.getByRole("button", { name: /Switch workspace/ });
    await switcher.focus();
    await rpage.keyboard.press("ArrowDown");
    const list = rpage.getByRole("list", { name: "Your workspaces" });
    await list.getByRole("link", { name: "New workspace" }).waitFor();
    expect(await list.getByRole("link", { name: new RegExp(workspaceName) }).count()).toBe(1);
    await screenshot(rpage, "08b-workspace-switcher-open");
    await rpage.keyboard.press("Escape");
    await list.waitFor({ state: "detached" });

    // 7. The members page is read-only for a reviewer: no invite form, no role selects.
    await rpage.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Members" }).click();
    await rpage.waitForURL(`**${workspacePath}/members`);
    await rpage.getByRole("cell", { name: ownerAccount.email, exact: true }).waitFor();
    await rpage.getByRole("cell", { name: reviewerAccount.email, exact: true }).waitFor();
    expect(await rpage.getByText(/this list is read-only/).count()).toBe(1);
    expect(await rpage.getByRole("form", { name: "Invite a colleague" }).count()).toBe(0);
    expect(await rpage.locator("main select").count()).toBe(0);
    expect(await rpage.getByRole("button", { name: /^Remove/ }).count()).toBe(0);
    await screenshot(rpage, "09-members-reviewer-read-only");
    expect(reviewerConsole.take()).toEqual([]);

    // 8. The account page: a name change shows up in the header.
    await rpage.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Account" }).click();
    await rpage.waitForURL("**/account");
    const renamed = `${reviewerAccount.name} (chassis)`;
    await rpage.getByLabel("Name", { exact: true }).fill(renamed);
    await rpage.getByRole("button", { name: "Save name" }).click();
    await rpage.getByText("Name saved.").waitFor();
    await rpage.getByRole("banner").getByText(renamed).waitFor();
    await screenshot(rpage, "10-account");
    expect(reviewerConsole.take()).toEqual([]);

    // 9. Back with the owner: change the reviewer's role, then remove them (with confirmation).
    const renamedCell = (p: typeof page) => p.getByRole("cell", { name: renamed, exact: true });
    await gotoApp(page, `${workspacePath}/members`);
    await renamedCell(page).waitFor();
    const roleSelect = page.getByRole("combobox", { name: `Role of ${renamed}` });
    expect(await roleSelect.inputValue()).toBe("reviewer");
    const patched = page.waitForResponse((r) => r.request().method() === "PATCH" && r.url().includes("/members/"));
    await roleSelect.selectOption("viewer");
    expect((await patched).status()).toBe(200);
    await page.reload({ waitUntil: "networkidle" });
    expect(await page.getByRole("combobox", { name: `Role of ${renamed}` }).inputValue()).toBe("viewer");

    await page.getByRole("button", { name: `Remove ${renamed}` }).click();
    const dialog = page.getByRole("dialog", { name: `Remove ${renamed}?` });
    await dialog.waitFor();
    await screenshot(page, "11-remove-confirmation");
    await dialog.getByRole("button", { name: "Remove member" }).click();
    await renamedCell(page).waitFor({ state: "detached" });
    expect(await page.getByRole("cell", { name: ownerAccount.email, exact: true }).count()).toBe(1);
    expect(ownerConsole.take()).toEqual([]);

    // The removed reviewer no longer gets in.
    const after = await rpage.goto(new URL(workspacePath, rpage.url()).href);
    expect(after?.status()).toBe(404);
  });
});
