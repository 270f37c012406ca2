import type { Page } from "playwright-core";
import { appUrl } from "./browser";
import { DEMO_PASSWORD } from "../../../scripts/seed/foundation";

export type Account = { name: string; email: string; password: string };

export function newAccount(label: string): Account {
  const stamp = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
  return { name: `${label} ${stamp}`, email: `${label.toLowerCase()}-${stamp}@example.com`, password: `long enough ${stamp}!` };
}

/** Fills the sign-up form on the current page (the e-mail may be prefilled from an invitation). */
export async function fillSignUp(page: Page, account: Account): Promise<void> {
  await page.getByLabel("Name", { exact: true }).fill(account.name);
  await page.getByLabel("E-mail", { exact: true }).fill(account.email);
  await page.getByLabel("Password", { exact: true }).fill(account.password);
  await page.getByRole("button", { name: "Create account" }).click();
}

export async function gotoApp(page: Page, path: string): Promise<void> {
  await page.goto(appUrl(path), { waitUntil: "networkidle" });
}

/** The path part of the current URL. */
export function pathOf(page: Page): string {
  return new URL(page.url()).pathname;
}

/** Signs a seeded demo user in; resolves with the id of the workspace the app lands on. */
export async function signInDemo(page: Page, email: string): Promise<string> {
  await gotoApp(page, "/sign-in");
  await page.getByLabel("E-mail", { exact: true }).fill(email);
  await page.getByLabel("Password", { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(/\/w\//);
  return pathOf(page).split("/")[2]!;
}
