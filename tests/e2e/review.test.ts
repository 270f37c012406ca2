// Design review end to end on the demo workspace (issue 6 §7): an editor saves v1, changes the
// van's mass, saves v2 and requests a review; the reviewer opens the comparison from the e-mail,
// comments on the rolling-resistance ledger row and requests changes; the editor finds the
// e-mail in the outbox and the thread on the row.
// Demo accounts come from scripts/seed/foundation.ts (seeded by scripts/test.sh).
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { appUrl, openPerson, screenshot, type Person } from "./support/browser";
import { ConsoleWatch } from "./support/console-watch";
import { gotoApp, signInDemo } from "./support/flows";
import { linkFromOutbox } from "./support/outbox";
import { DEMO_USERS } from "../../scripts/seed/foundation";

const user = (role: string) => DEMO_USERS.find((u) => u.role === role)!;

async function createVan(page: Page, name: string): Promise<{ workspaceId: string; documentId: string }> {
  const me = await page.request.get(appUrl("/api/me"));
  const { workspaces } = (await me.json()) as { workspaces: { id: string }[] };
  const workspaceId = workspaces[0]!.id;
  const res = await page.request.post(appUrl(`/api/workspaces/${workspaceId}/documents`), {
    data: { name, powertrain: "conventional" },
    headers: { origin: new URL(appUrl("/")).origin },
  });
  expect(res.status()).toBe(201);
  return { workspaceId, documentId: ((await res.json()) as { document: { id: string } }).document.id };
}

async function saveVersion(page: Page, path: string, name: string, expected: string): Promise<void> {
  await gotoApp(page, `${path}/versions`);
  await page.getByLabel("Version name").fill(name);
  await page.getByLabel("Message (optional)").fill(`${name}: saved by the browser test`);
  await page.getByRole("button", { name: "Save version" }).click();
  await page.getByText(expected).waitFor();
}

const massField = (page: Page) => page.locator('[data-block-kind="body"] [data-field="mass"] .cm-content');

describe("design review: versions, diff, comments, verdicts, e-mail", () => {
  let editor: Person, reviewer: Person;
  let watches: ConsoleWatch[] = [];
  beforeAll(async () => {
    [editor, reviewer] = await Promise.all([openPerson(), openPerson()]);
    watches = [editor, reviewer].map((p) => new ConsoleWatch(p.page));
  });
  afterAll(async () => {
    await Promise.all([editor?.close(), reviewer?.close()]);
  });

  test("editor saves v1 and v2 and asks for a review; reviewer comments on the rolling-resistance row and requests changes; editor finds both", async () => {
    const ed = editor.page;
    await signInDemo(ed, user("editor").email);
    const { workspaceId, documentId } = await createVan(ed, `Van review ${Date.now().toString(36)}`);
    const path = `/w/${workspaceId}/documents/${documentId}`;

    await saveVersion(ed, path, "Empty van", "Saved as v1.");

    // The van's mass: template kerb mass + payload (1500 kg) → 2100 kg, typed in the notebook.
    await gotoApp(ed, path);
    await ed.locator('[data-connection="connected"]').waitFor();
    await massField(ed).click();
    await ed.keyboard.press("Control+A");
    await ed.keyboard.insertText("2100 kg");
    // the collaboration server stores an edit before relaying it; wait until the server sees it
    const v1 = async () => ((await (await ed.request.get(appUrl(`/api/workspaces/${workspaceId}/documents/${documentId}/versions`))).json()) as { versions: { id: string }[] }).versions[0]!.id;
    const v1Id = await v1();
    await expect.poll(async () => {
      const r = await ed.request.get(appUrl(`/api/workspaces/${workspaceId}/documents/${documentId}/diff?from=${v1Id}&to=live`));
      return ((await r.json()) as { diff?: { counts: { changed: number } } }).diff?.counts.changed ?? 0;
    }, { timeout: 10_000 }).toBe(1);
    await screenshot(ed, "rev1-editor-mass-changed");

    await saveVersion(ed, path, "Loaded van", "Saved as v2.");
    await expect.poll(() => ed.locator("[data-version]").count()).toBe(2);
    await screenshot(ed, "rev2-version-list");

    // Request a review of v2 (the newest version is preselected) from the demo reviewer.
    await gotoApp(ed, `${path}/reviews`);
    await ed.getByLabel(user("reviewer").name).check();
    await ed.getByLabel("Message (optional)").fill("Payload up to 2 t: please check the road-load side.");
    await ed.getByRole("button", { name: "Request review" }).click();
    await ed.getByText(/Review of v2 requested/).waitFor();

    // The reviewer follows the link in the e-mail to the comparison v1 → v2.
    const rv = reviewer.page;
    await signInDemo(rv, user("reviewer").email);
    const link = await linkFromOutbox(rv, user("reviewer").email, `/documents/${documentId}/diff?`);
    await rv.goto(link, { waitUntil: "networkidle" });
    await rv.locator("[data-diff]").waitFor();
    const massRow = rv.locator('[data-block-diff] [data-param="mass"]');
    await expect.poll(() => massRow.innerText()).toMatch(/curb_mass \+ payload[\s\S]*1500 kg[\s\S]*2100 kg[\s\S]*\+600 kg/);
    const rolling = rv.locator('tr[data-ledger-row="rolling"]');
    await rolling.getByRole("button", { name: /Comment/ }).click();
    await rv.getByLabel("New comment on Loss ledger › Rolling resistance").fill("Rolling resistance grows by **a third**: is c_r = `0.010` still right at 2.1 t? @ben");
    await rv.getByRole("button", { name: "Comment", exact: true }).click();
    await rv.locator('[data-thread="rolling"]').first().getByText("a third").waitFor();
    await screenshot(rv, "rev3-reviewer-comment-on-rolling-row");
    await rv.getByLabel("Request changes").check();
    await rv.getByLabel(/Comment \(say which changes\)/).fill("Use the tyre maker's c_r for the loaded van.");
    await rv.getByRole("button", { name: "Send verdict" }).click();
    await rv.getByText("You requested changes.").waitFor();
    await rv.locator('[data-review-state="changes_requested"]').first().waitFor();
    await screenshot(rv, "rev4-reviewer-requested-changes");

    // The editor finds the verdict e-mail, follows it, and finds the thread on the row.
    const verdictLink = await linkFromOutbox(ed, user("editor").email, `/documents/${documentId}/reviews`);
    await screenshot(ed, "rev5-editor-outbox");
    await ed.goto(verdictLink, { waitUntil: "networkidle" });
    await ed.locator('[data-round] [data-review-state="changes_requested"]').waitFor();
    await ed.getByText("Use the tyre maker's c_r for the loaded van.").waitFor();
    await screenshot(ed, "rev5b-editor-reviews-page");
    await ed.getByRole("link", { name: "See what changed" }).click();
    await ed.locator("[data-diff]").waitFor();
    const row = ed.locator('tr[data-ledger-row="rolling"]');
    await row.getByRole("button", { name: /1 thread \(1 open\)/ }).click();
    const thread = ed.locator('tr [data-thread="rolling"]');
    await thread.getByText(/is c_r =/).waitFor();
    expect(await thread.locator("strong").first().innerText()).toBe("a third");
    await screenshot(ed, "rev6-editor-finds-thread-on-row");

    // The mention e-mailed the editor too, and the documents table shows the round's state.
    await gotoApp(ed, "/dev/outbox");
    const mention = ed.getByRole("article").filter({ hasText: "mentioned you" }).filter({ hasText: user("editor").email }).first();
    const threadLink = await mention.locator('a[href*="#thread-"]').first().getAttribute("href");
    await ed.goto(threadLink!, { waitUntil: "networkidle" });
    await ed.locator('[data-thread="rolling"]').first().getByText(/is c_r =/).waitFor();
    await screenshot(ed, "rev7-editor-version-page-from-mention");
    await gotoApp(ed, `/w/${workspaceId}/documents`);
    await ed.locator(`[data-document-row="${documentId}"] [data-review-state="changes_requested"]`).waitFor();

    for (const w of watches) expect(w.take()).toEqual([]);
  });
});
