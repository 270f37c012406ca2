// Password reset through the e-mailed single-use link, read from the development outbox.
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { openPerson, screenshot, type Person } from "./support/browser";
import { ConsoleWatch } from "./support/console-watch";
import { fillSignUp, gotoApp, newAccount } from "./support/flows";
import { linkFromOutbox } from "./support/outbox";

describe("password reset", () => {
  let person: Person;
  let watch: ConsoleWatch;
  beforeAll(async () => {
    person = await openPerson();
    watch = new ConsoleWatch(person.page);
  });
  afterAll(async () => {
    await person?.close();
  });

  test("forgot password → mail → new password → sign in; the link works once", async () => {
    const page = person.page;
    const account = newAccount("Forgetful");
    const newPassword = `${account.password} renewed`;

    await gotoApp(page, "/sign-up");
    await fillSignUp(page, account);
    await page.waitForURL("**/workspaces/new");
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL("**/sign-in");

    await page.getByRole("link", { name: "Forgot your password?" }).click();
    await page.waitForURL("**/forgot-password");
    await page.getByLabel("E-mail", { exact: true }).fill(account.email);
    await page.getByRole("button", { name: "Send reset link" }).click();
    await page.getByRole("status").filter({ hasText: "a reset link is on its way" }).waitFor();
    await screenshot(page, "r1-forgot-password-sent");
    expect(watch.take()).toEqual([]);

    const link = await linkFromOutbox(page, account.email, "/reset-password?token=");
    const resetPath = new URL(link).pathname + new URL(link).search;
    await gotoApp(page, resetPath);
    await page.getByLabel("New password").fill(newPassword);
    await page.getByRole("button", { name: "Set new password" }).click();
    await page.getByText("Your password is changed").waitFor();
    await screenshot(page, "r2-reset-done");
    expect(watch.take()).toEqual([]);

    // The same link again is refused (410), at the top of the form.
    await gotoApp(page, resetPath);
    await page.getByLabel("New password").fill(`${newPassword} again`);
    await page.getByRole("button", { name: "Set new password" }).click();
    // (filtered by text: Next's route announcer is an empty role=alert element too)
    await page.getByRole("alert").filter({ hasText: /expired or was already used/i }).waitFor();
    await screenshot(page, "r3-reset-link-reused");
    expect(watch.take().filter((e) => !e.includes("status of 410"))).toEqual([]);

    // The new password signs in.
    await gotoApp(page, "/sign-in");
    await page.getByLabel("E-mail", { exact: true }).fill(account.email);
    await page.getByLabel("Password", { exact: true }).fill(newPassword);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL("**/workspaces/new");
    expect(watch.take()).toEqual([]);
  });
});
