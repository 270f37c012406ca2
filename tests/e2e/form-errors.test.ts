// Forms tell people what is wrong, where: schema messages next to the field (same zod schema as
// the route handler, so no request is sent), server refusals (401, 409) at the top of the form.
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { openPerson, screenshot, type Person } from "./support/browser";
import { ConsoleWatch } from "./support/console-watch";
import { fillSignUp, gotoApp, newAccount } from "./support/flows";

// Chromium logs every 4xx answer as a console error; those we provoke on purpose are expected.
function unexpected(errors: string[], statuses: number[]): string[] {
  return errors.filter((e) => !statuses.some((s) => e.includes(`status of ${s}`)));
}

describe("form errors", () => {
  let person: Person;
  let watch: ConsoleWatch;
  beforeAll(async () => {
    person = await openPerson();
    watch = new ConsoleWatch(person.page);
  });
  afterAll(async () => {
    await person?.close();
  });

  test("sign-up, sign-in and invite refusals are shown where they belong", async () => {
    const page = person.page;
    const account = newAccount("Formcheck");

    // Empty sign-up: three field messages, tied to their inputs, and no request.
    await gotoApp(page, "/sign-up");
    await page.getByRole("button", { name: "Create account" }).click();
    const name = page.getByLabel("Name", { exact: true });
    await page.getByText("Enter a name").waitFor();
    expect(await name.getAttribute("aria-invalid")).toBe("true");
    const describedBy = (await name.getAttribute("aria-describedby")) ?? "";
    expect(await page.locator(`[id="${describedBy.split(" ").pop()}"]`).innerText()).toBe("Enter a name");
    await page.getByText("Enter your e-mail address").waitFor();
    await page.getByText("Use at least 10 characters").waitFor();
    await screenshot(page, "e1-sign-up-field-errors");
    expect(watch.take()).toEqual([]);

    // A password equal to the e-mail address is refused by the shared schema.
    await page.getByLabel("E-mail", { exact: true }).fill("same-as-password@example.com");
    await page.getByLabel("Password", { exact: true }).fill("same-as-password@example.com");
    await page.getByRole("button", { name: "Create account" }).click();
    await page.getByText("The password must not be your e-mail address").waitFor();

    // A real sign-up, then the same address again from a signed-out page: 409 at the top.
    await fillSignUp(page, account);
    await page.waitForURL("**/workspaces/new");
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL("**/sign-in");
    await gotoApp(page, "/sign-up");
    await fillSignUp(page, account);
    await page.getByRole("alert").filter({ hasText: "An account with this e-mail address already exists" }).waitFor();
    await screenshot(page, "e2-sign-up-duplicate");
    expect(unexpected(watch.take(), [409])).toEqual([]);

    // Wrong password: 401 at the top of the sign-in form.
    await gotoApp(page, "/sign-in");
    await page.getByLabel("E-mail", { exact: true }).fill(account.email);
    await page.getByLabel("Password", { exact: true }).fill("not the password at all");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.getByRole("alert").filter({ hasText: "The e-mail address or the password is wrong" }).waitFor();
    await screenshot(page, "e3-sign-in-wrong-password");
    expect(unexpected(watch.take(), [401])).toEqual([]);

    // Signed in again, a workspace, and an invitation to someone already in it: 409 at the top.
    await page.getByLabel("Password", { exact: true }).fill(account.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL("**/workspaces/new");
    await page.getByLabel("Workspace name").fill("Form check");
    await page.getByRole("button", { name: "Create workspace" }).click();
    await page.waitForURL(/\/w\/[0-9a-f-]{36}$/);
    await gotoApp(page, `${new URL(page.url()).pathname}/members`);
    const form = page.getByRole("form", { name: "Invite a colleague" });
    await form.getByLabel("E-mail").fill(account.email);
    await form.getByRole("button", { name: "Send invitation" }).click();
    await form.getByRole("alert").filter({ hasText: "is already a member of this workspace" }).waitFor();
    await screenshot(page, "e4-invite-existing-member");
    expect(unexpected(watch.take(), [409])).toEqual([]);
  });
});
