// Two people co-edit one scenario document in two browsers: the editor's change of the vehicle
// mass reaches the other editor through the collaboration server, and both see the headline
// figures recalculated by their own evaluation worker. A reviewer follows along read-only.
// Demo accounts come from scripts/seed/foundation.ts (seeded by scripts/test.sh).
import { mkdirSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { appUrl, openPerson, screenshot, type Person } from "./support/browser";
import { ConsoleWatch } from "./support/console-watch";
import { gotoApp, signInDemo } from "./support/flows";
import { DEMO_USERS } from "../../scripts/seed/foundation";

const email = (role: string) => DEMO_USERS.find((u) => u.role === role)!.email;

/** The demo workspace id, and a fresh parallel-hybrid document in it created through the API. */
async function createDocument(page: Page, name: string): Promise<{ workspaceId: string; documentId: string }> {
  const me = await page.request.get(appUrl("/api/me"));
  expect(me.status()).toBe(200);
  const { workspaces } = (await me.json()) as { workspaces: { id: string; name: string }[] };
  const workspaceId = workspaces[0]!.id;
  const res = await page.request.post(appUrl(`/api/workspaces/${workspaceId}/documents`), {
    data: { name, powertrain: "parallel" },
    headers: { origin: new URL(appUrl("/")).origin },
  });
  expect(res.status()).toBe(201);
  const { document } = (await res.json()) as { document: { id: string } };
  return { workspaceId, documentId: document.id };
}

const massField = (page: Page) => page.locator('[data-block-kind="body"] [data-field="mass"] .cm-content');
/** The field's text without the remote cursors (name flags) that y-codemirror draws inside it. */
const massText = (page: Page) =>
  massField(page).evaluate((el) => {
    const copy = el.cloneNode(true) as HTMLElement;
    copy.querySelectorAll(".cm-ySelectionCaret, .cm-ySelectionInfo, .cm-widgetBuffer").forEach((n) => n.remove());
    return (copy.textContent ?? "").replace(/\u2060/g, "");
  });
const fuelFigure = (page: Page) => page.locator('[data-block-kind="headline_figures"] [data-kpi="fuel"]');

/** Full page from the top (the notebook header is sticky), and one block close up. */
async function pageShot(page: Page, name: string): Promise<void> {
  await page.evaluate(() => window.scrollTo(0, 0));
  await screenshot(page, name);
}

async function blockShot(page: Page, kind: string, name: string): Promise<void> {
  const dir = join(process.env.ARTIFACTS_DIR ?? "artifacts", "screenshots");
  mkdirSync(dir, { recursive: true });
  const block = page.locator(`[data-block-kind="${kind}"]`).first();
  await block.scrollIntoViewIfNeeded();
  await block.screenshot({ path: join(dir, `${name}.png`) });
}

async function openDocument(page: Page, path: string): Promise<void> {
  await gotoApp(page, path);
  await page.locator('[data-connection="connected"]').waitFor();
  await fuelFigure(page).waitFor();
}

describe("notebook: two people in one document", () => {
  let a: Person, b: Person, reviewer: Person;
  let shared: { path: string } | null = null;
  let watches: ConsoleWatch[] = [];
  beforeAll(async () => {
    [a, b, reviewer] = await Promise.all([openPerson(), openPerson(), openPerson()]);
    watches = [a, b, reviewer].map((p) => new ConsoleWatch(p.page));
  });
  afterAll(async () => {
    await Promise.all([a?.close(), b?.close(), reviewer?.close()]);
  });

  test("an edit by one editor reaches the other with recalculated figures; a reviewer cannot type", async () => {
    await signInDemo(a.page, email("editor"));
    await signInDemo(b.page, email("owner"));
    await signInDemo(reviewer.page, email("reviewer"));
    const { workspaceId, documentId } = await createDocument(a.page, `Van co-edit ${Date.now().toString(36)}`);
    const path = `/w/${workspaceId}/documents/${documentId}`;
    await Promise.all([openDocument(a.page, path), openDocument(b.page, path), openDocument(reviewer.page, path)]);

    // Everyone sees the same figure before the edit; the template's mass is a formula.
    const before = await fuelFigure(b.page).innerText();
    expect(before).toMatch(/^\d+\.\d\d$/);
    expect(await fuelFigure(a.page).innerText()).toBe(before);
    expect(await massText(b.page)).toBe("curb_mass + payload");

    // Presence: B sees A in the document.
    const aName = DEMO_USERS.find((u) => u.role === "editor")!.name;
    await b.page.locator("[data-presence]").getByText(aName).waitFor();

    // A replaces the mass by 2400 kg (from 1600 kg): more inertia and rolling work, more fuel.
    await massField(a.page).click();
    await a.page.keyboard.press("Control+A");
    await a.page.keyboard.insertText("2400 kg");
    await expect.poll(() => massText(b.page), { timeout: 10_000 }).toBe("2400 kg");
    await expect.poll(() => fuelFigure(b.page).innerText(), { timeout: 10_000 }).not.toBe(before);
    const after = await fuelFigure(b.page).innerText();
    expect(Number(after)).toBeGreaterThan(Number(before));
    await expect.poll(() => fuelFigure(a.page).innerText(), { timeout: 10_000 }).toBe(after);
    // B's compiled value under the field follows the text.
    await expect.poll(() => b.page.locator('[data-block-kind="body"] [data-field="mass"] [data-compiled-value]').innerText()).toBe("= 2400 kg");
    await pageShot(a.page, "nb1-editor-a-after-edit");
    await pageShot(b.page, "nb2-editor-b-sees-edit");
    await blockShot(b.page, "body", "nb2a-editor-b-body-block-with-a-cursor");
    await blockShot(b.page, "headline_figures", "nb2b-editor-b-headline-figures");
    await blockShot(b.page, "loss_ledger", "nb2c-editor-b-loss-ledger");
    await blockShot(b.page, "traces", "nb2d-editor-b-traces");

    // The reviewer sees the edit too, but cannot change a field or add blocks.
    await expect.poll(() => massText(reviewer.page), { timeout: 10_000 }).toBe("2400 kg");
    await expect.poll(() => fuelFigure(reviewer.page).innerText(), { timeout: 10_000 }).toBe(after);
    expect(await massField(reviewer.page).getAttribute("contenteditable")).toBe("false");
    await massField(reviewer.page).click();
    await reviewer.page.keyboard.type("9999");
    await reviewer.page.waitForTimeout(500);
    expect(await massText(reviewer.page)).toBe("2400 kg");
    expect(await massText(a.page)).toBe("2400 kg");
    expect(await reviewer.page.getByRole("button", { name: "+ Add block" }).count()).toBe(0);
    await reviewer.page.locator("[data-read-only]").waitFor();
    await pageShot(reviewer.page, "nb3-reviewer-read-only");

    // Undo is per person: A's Ctrl+Z restores the formula for everyone.
    // A's figures reach the documents list (throttled PUT …/summary) after A's own edits.
    // (the one carrying the restored figure; earlier uploads may still be under way).
    const restored = (r: { url(): string; request(): { method(): string; postDataJSON(): unknown } }) => {
      if (!r.url().endsWith("/summary") || r.request().method() !== "PUT") return false;
      const kpi = (r.request().postDataJSON() as { kpi: { fuel_l_per_100km: number } }).kpi;
      return kpi.fuel_l_per_100km.toFixed(2) === before;
    };
    const summaryPut = a.page.waitForResponse(restored, { timeout: 15_000 });
    await massField(a.page).click();
    await a.page.keyboard.press("Control+Z");
    await expect.poll(() => massText(b.page), { timeout: 10_000 }).toBe("curb_mass + payload");
    await expect.poll(() => fuelFigure(b.page).innerText(), { timeout: 10_000 }).toBe(before);

    expect((await summaryPut).status()).toBe(200);

    // Offline: A's edit stays in A's tab (badge says so), and arrives when A is back online.
    await a.context.setOffline(true);
    await a.page.locator('[data-connection="offline"]').waitFor();
    await massField(a.page).click();
    await a.page.keyboard.press("Control+A");
    await a.page.keyboard.insertText("2000 kg");
    await a.page.locator("[data-unsynced]").waitFor();
    await b.page.waitForTimeout(1000);
    expect(await massText(b.page)).toBe("curb_mass + payload");
    await pageShot(a.page, "nb4-editor-a-offline-unsynced");
    await a.context.setOffline(false);
    await a.page.locator('[data-connection="connected"]:not([data-unsynced])').waitFor({ timeout: 20_000 });
    await expect.poll(() => massText(b.page), { timeout: 20_000 }).toBe("2000 kg");

    for (const w of watches) expect(w.take()).toEqual([]);
    shared = { path };
  });

  test("blocks: add, move, duplicate, collapse and delete reach the other editor; undo puts them back", async () => {
    expect(shared).not.toBeNull();
    const kinds = (page: Page) => page.locator("[data-block-kind]").evaluateAll((els) => els.map((e) => e.getAttribute("data-block-kind")));
    const start = await kinds(b.page);

    // Add an energy-flow view at the end: both see it, with its chart.
    await a.page.getByRole("button", { name: "+ Add block" }).first().click();
    await a.page.getByRole("menuitem", { name: "Energy flow" }).click();
    await expect.poll(() => kinds(b.page), { timeout: 10_000 }).toEqual([...start, "energy_flow"]);
    await b.page.locator('[data-block-kind="energy_flow"] canvas').waitFor();

    // Move it up one place with the keyboard (Alt+↑ on the block), then duplicate the copy's neighbour.
    await a.page.locator('[data-block-kind="energy_flow"]').focus();
    await a.page.keyboard.press("Alt+ArrowUp");
    const moved = [...start.slice(0, -1), "energy_flow", start[start.length - 1]];
    await expect.poll(() => kinds(b.page), { timeout: 10_000 }).toEqual(moved);
    await a.page.getByRole("button", { name: "Duplicate Energy flow", exact: true }).click();
    await expect.poll(() => kinds(b.page).then((k) => k.filter((x) => x === "energy_flow").length), { timeout: 10_000 }).toBe(2);

    // Collapse is shared for editors; delete removes the copy for everyone.
    await a.page.getByRole("button", { name: "Collapse Energy flow (copy)" }).click();
    await expect.poll(() => b.page.locator('[data-block-kind="energy_flow"]').nth(1).locator("canvas").count(), { timeout: 10_000 }).toBe(0);
    await a.page.getByRole("button", { name: "Delete Energy flow (copy)" }).click();
    await expect.poll(() => kinds(b.page), { timeout: 10_000 }).toEqual(moved);
    await pageShot(b.page, "nb5-editor-b-after-block-edits");

    // Undo (outside the editors) four times: delete, collapse, duplicate, move → energy flow back at the end.
    for (let i = 0; i < 4; i++) await a.page.getByRole("button", { name: "Undo", exact: true }).click();
    await expect.poll(() => kinds(b.page), { timeout: 10_000 }).toEqual([...start, "energy_flow"]);

    // A formula error shows under the field, for everyone, with the character it concerns; the
    // figures stay on the last valid result, marked as such.
    await massField(a.page).click();
    await a.page.keyboard.press("Control+A");
    await a.page.keyboard.insertText("curb_mass + (2");
    const error = b.page.locator('[data-block-kind="body"] [data-field="mass"] [role="alert"]');
    await expect.poll(() => error.innerText(), { timeout: 10_000 }).toContain("Missing )");
    expect(await error.innerText()).toContain("at character 15");
    await b.page.getByText("Showing the last valid result").first().waitFor();
    await blockShot(b.page, "body", "nb6-editor-b-formula-error");
    await a.page.keyboard.press("Control+Z");
    await expect.poll(() => error.count(), { timeout: 10_000 }).toBe(0);
    for (const w of watches) expect(w.take()).toEqual([]);
  });
});

describe("notebook: the session ends while a document is open", () => {
  let p: Person;
  let watch: ConsoleWatch;
  beforeAll(async () => {
    p = await openPerson();
    watch = new ConsoleWatch(p.page);
  });
  afterAll(async () => {
    await p?.close();
  });

  test("signed out elsewhere: the next connection is refused, the notebook says so and stops retrying", async () => {
    const page = p.page;
    await signInDemo(page, email("editor"));
    const { workspaceId, documentId } = await createDocument(page, `Session end ${Date.now().toString(36)}`);
    await openDocument(page, `/w/${workspaceId}/documents/${documentId}`);
    // Signed out from another tab of the same browser (same cookie jar).
    const out = await page.request.post(appUrl("/api/auth/sign-out"), { headers: { origin: new URL(appUrl("/")).origin } });
    expect(out.ok()).toBe(true);
    // A network blip with an edit meanwhile makes the notebook reconnect; the collaboration server
    // refuses the upgrade with 401 (server/collab/admission.ts), which the page learns from the app.
    await p.context.setOffline(true);
    await page.locator('[data-connection="offline"]').waitFor();
    await massField(page).click();
    await page.keyboard.press("Control+A");
    await page.keyboard.insertText("1900 kg");
    await p.context.setOffline(false);
    await page.locator('[data-connection="session-ended"]').waitFor({ timeout: 20_000 });
    const notice = page.getByRole("alert").filter({ hasText: "Your session ended — sign in again" });
    await notice.waitFor();
    expect(await notice.getByRole("link", { name: "Sign in" }).getAttribute("href")).toBe(`/sign-in?next=${encodeURIComponent(`/w/${workspaceId}/documents/${documentId}`)}`);
    await pageShot(page, "nb9-session-ended");
    // No reconnect loop: no new WebSocket while y-websocket's backoff (≤ 2.5 s) would have retried twice.
    let attempts = 0;
    page.on("websocket", () => attempts++);
    await page.waitForTimeout(6000);
    expect(attempts).toBe(0);
    expect(await page.locator('[data-connection="session-ended"]').count()).toBe(1);
    // Provoked on purpose: the app's answers while signed out are 401s, and Chromium reports the
    // upgrade refused with 401 as "HTTP Authentication failed".
    const expected = (e: string) => /status of 401\b/.test(e) || /WebSocket connection to .* failed: HTTP Authentication failed/.test(e);
    expect(watch.take().filter((e) => !expected(e))).toEqual([]);
  });
});
