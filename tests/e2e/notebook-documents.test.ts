// The documents table: an editor creates a document from a template (and lands in it), finds it
// by search, renames, duplicates and archives it (with undo); a reviewer gets the list read-only.
// Demo accounts come from scripts/seed/foundation.ts (seeded by scripts/test.sh).
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { openPerson, screenshot, type Person } from "./support/browser";
import { ConsoleWatch } from "./support/console-watch";
import { gotoApp, signInDemo } from "./support/flows";
import { DEMO_USERS } from "../../scripts/seed/foundation";

const email = (role: string) => DEMO_USERS.find((u) => u.role === role)!.email;

const row = (page: Page, name: string) => page.locator("[data-document-row]").filter({ has: page.getByRole("link", { name, exact: true }) });

describe("documents table", () => {
  let editor: Person, reviewer: Person;
  let watches: ConsoleWatch[] = [];
  beforeAll(async () => {
    [editor, reviewer] = await Promise.all([openPerson(), openPerson()]);
    watches = [editor, reviewer].map((p) => new ConsoleWatch(p.page));
  });
  afterAll(async () => {
    await Promise.all([editor?.close(), reviewer?.close()]);
  });

  test("create from a template, search, rename, duplicate, archive with undo; reviewers read only", async () => {
    const page = editor.page;
    const workspaceId = await signInDemo(page, email("editor"));
    const stamp = Date.now().toString(36);
    const name = `Hub shuttle ${stamp}`;

    // New document: name + powertrain → the notebook of the new document, built from the template.
    await gotoApp(page, `/w/${workspaceId}/documents`);
    await page.getByRole("button", { name: "New document" }).click();
    await page.getByLabel("Name", { exact: true }).fill(name);
    await page.getByLabel("Powertrain", { exact: true }).selectOption("series");
    await screenshot(page, "nd1-new-document-dialog");
    await page.getByRole("button", { name: "Create document" }).click();
    await page.waitForURL(/\/documents\/[0-9a-f-]{36}$/);
    await page.locator("[data-document-name]").filter({ hasText: name }).waitFor();
    await page.locator('[data-block-kind="generator_set"]').waitFor(); // the series template has one
    await page.locator('[data-block-kind="headline_figures"] [data-kpi="fuel"]').waitFor();

    // Back in the list: search narrows to it; its headline figure was stored by the editor's page.
    await gotoApp(page, `/w/${workspaceId}/documents`);
    await page.getByLabel("Search").fill(stamp);
    await expect.poll(() => page.locator("[data-document-row]").count()).toBe(1);
    await expect.poll(() => row(page, name).locator("td").nth(2).innerText(), { timeout: 15_000 }).toMatch(/^\d+\.\d\d L\/100 km/);

    // Rename.
    await row(page, name).getByRole("button", { name: /^Rename/ }).click();
    const renamed = `${name} v2`;
    await page.getByRole("dialog").getByLabel("Name", { exact: true }).fill(renamed);
    await page.getByRole("button", { name: "Rename", exact: true }).click();
    await row(page, renamed).waitFor();

    // Duplicate: a copy appears.
    await row(page, renamed).getByRole("button", { name: /^Duplicate/ }).click();
    await row(page, `${renamed} (copy)`).waitFor();
    await screenshot(page, "nd2-documents-after-duplicate");

    // Archive the copy, undo, archive again: it moves to the archived list.
    const copy = `${renamed} (copy)`;
    await row(page, copy).getByRole("button", { name: /^Archive/ }).click();
    await page.getByRole("status").filter({ hasText: "Archived" }).getByRole("button", { name: "Undo" }).click();
    await row(page, copy).waitFor();
    await row(page, copy).getByRole("button", { name: /^Archive/ }).click();
    await expect.poll(() => row(page, copy).count()).toBe(0);
    await page.getByLabel("Show archived").check();
    await row(page, copy).waitFor();
    await screenshot(page, "nd3-archived-documents");

    // Sorting by name puts "…v2" before "…v2 (copy)" ascending and after it descending.
    await page.getByLabel("Show archived").uncheck();
    await page.getByLabel("Search").fill("");
    await page.getByRole("button", { name: /^Name/ }).click();
    await expect.poll(() => page.locator("th[aria-sort]").first().getAttribute("aria-sort")).toBe("ascending");

    // Workspace overview: the same number of documents as the list (archived ones left out), the
    // renamed document among the recently updated with its headline figure, the archived copy not.
    await gotoApp(page, `/w/${workspaceId}/documents`); // fresh: default query, no previous rows kept
    await row(page, renamed).waitFor();
    const listed = await page.locator("[data-document-row]").count();
    expect(listed).toBeGreaterThan(0);
    await gotoApp(page, `/w/${workspaceId}`);
    const overview = page.getByTestId("overview-documents");
    await overview.waitFor();
    expect(Number(await overview.getByTestId("document-count").innerText())).toBe(listed);
    expect(await page.getByText("No documents in this workspace yet").count()).toBe(0);
    const recent = page.getByRole("list", { name: "Recently updated documents" }).getByRole("listitem");
    expect(await recent.count()).toBe(Math.min(5, listed));
    const mine = recent.filter({ has: page.getByRole("link", { name: renamed, exact: true }) });
    expect(await mine.innerText()).toMatch(/series hybrid[\s\S]*\d+\.\d\d L\/100 km/);
    expect(await recent.filter({ hasText: copy }).count()).toBe(0);
    await screenshot(page, "nd3b-workspace-overview");
    await mine.getByRole("link", { name: renamed, exact: true }).click();
    await page.waitForURL(/\/documents\/[0-9a-f-]{36}$/);
    await page.locator("[data-document-name]").filter({ hasText: renamed }).waitFor();

    // Reviewer: the list, no create/rename/duplicate/archive.
    const rp = reviewer.page;
    await signInDemo(rp, email("reviewer"));
    await gotoApp(rp, `/w/${workspaceId}/documents`);
    await row(rp, renamed).waitFor();
    expect(await rp.getByRole("button", { name: "New document" }).count()).toBe(0);
    expect(await row(rp, renamed).getByRole("button").count()).toBe(0);
    await rp.getByText("You are a reviewer here").waitFor();
    await screenshot(rp, "nd4-documents-reviewer");

    for (const w of watches) expect(w.take()).toEqual([]);
  });
});
