// Issue 7 in a real browser: upload a drive cycle (with a unit the header does not give, so the
// user confirms it), see the preview, statistics and label, fix a broken file's message, save,
// find it in the library list; then create an API token, see it once, and evaluate with it.
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { openPerson, screenshot, appUrl, type Person } from "./support/browser";
import { ConsoleWatch } from "./support/console-watch";
import { fillSignUp, gotoApp, newAccount, pathOf } from "./support/flows";

const GOOD = "time,speed\n0,0\n10,10\n20,10\n30,0\n";
const BROKEN = "time [s],speed [km/h]\n0,0\n1,fast\n2,2\n";

describe("team library and API tokens in the browser", () => {
  let person: Person;
  let watch: ConsoleWatch;
  beforeAll(async () => {
    person = await openPerson();
    watch = new ConsoleWatch(person.page);
  });
  afterAll(async () => person?.close());

  test("upload, confirm the unit, save; then a token that evaluates", async () => {
    const page = person.page;
    await gotoApp(page, "/sign-up");
    await fillSignUp(page, newAccount("Uploader"));
    await page.waitForURL("**/workspaces/new");
    await page.getByLabel("Workspace name").fill(`Library ${Date.now().toString(36)}`);
    await page.getByRole("button", { name: "Create workspace" }).click();
    await page.waitForURL(/\/w\/[0-9a-f-]{36}$/);
    const workspacePath = pathOf(page);

    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Library" }).click();
    await page.waitForURL(`**${workspacePath}/library`);
    await page.getByText("The library is empty.").waitFor();

    // a broken file: the message names line 3, column 2
    await page.getByLabel(/CSV or TSV file/).setInputFiles({ name: "broken.csv", mimeType: "text/csv", buffer: Buffer.from(BROKEN) });
    await page.getByText('line 3, column 2 (speed [km/h]): "fast" is not a number').waitFor();
    await screenshot(page, "library-01-issue");

    // a good file whose header has no units: the guess (km/h) is noted; the user picks m/s
    await page.getByLabel(/CSV or TSV file/).setInputFiles({ name: "depot.csv", mimeType: "text/csv", buffer: Buffer.from(GOOD) });
    await page.getByText('speed unit not given in "speed"; assumed km/h').waitFor();
    await page.getByText("0.056 km").waitFor(); // trapezoids (5 + 10 + 5)·10 s = 200 km/h·s = 55.6 m
    await page.locator("select").filter({ has: page.locator("option[value='mph']") }).selectOption("m/s");
    await page.getByText("0.200 km").waitFor(); // the same numbers in m/s: 200 m
    await page.getByText("published cycles are checked at 1 Hz; this cycle has a 10 s step").waitFor();
    await screenshot(page, "library-02-preview");
    await page.getByLabel("Source note").fill("logged on the depot loop");
    await page.getByRole("button", { name: "Save to the library" }).click();
    await page.getByRole("cell", { name: /^depot/ }).waitFor();
    expect(await page.locator("table").innerText()).toContain("logged on the depot loop");
    expect(await page.locator("table").innerText()).toContain("not used");
    await screenshot(page, "library-03-saved");

    // use it in a document: a drive-cycle block whose source is the library
    const workspaceId = workspacePath.split("/")[2]!;
    const items = (await (await page.request.get(appUrl(`/api/workspaces/${workspaceId}/library`))).json()) as { items: { id: string }[] };
    const itemId = items.items[0]!.id;
    const created = await page.request.post(appUrl(`/api/workspaces/${workspaceId}/documents`), {
      data: { name: "Depot van", powertrain: "bev" }, headers: { origin: new URL(appUrl("/")).origin },
    });
    expect(created.status()).toBe(201);
    const documentId = ((await created.json()) as { document: { id: string } }).document.id;
    await gotoApp(page, `/w/${workspaceId}/documents/${documentId}`);
    await page.locator('[data-connection="connected"]').waitFor();
    const cycleBlock = page.locator('[data-block-kind="drive_cycle"]');
    await cycleBlock.locator('[data-field="source"] select').selectOption("library");
    // the picker lists the workspace's cycles by name and stores the id in the block
    const picker = cycleBlock.locator('[data-field="library_id"] select');
    expect(await picker.locator("option:checked").innerText()).toBe("none");
    await picker.selectOption(itemId);
    expect(await picker.locator("option:checked").innerText()).toMatch(/^depot/);
    // the uploaded 30 s, 200 m cycle is evaluated live in the page
    await page.locator('[data-block-kind="headline_figures"]').getByText("0.20 km in 30 s").waitFor();
    await screenshot(page, "library-04-document-uses-cycle");

    // a battery OCV curve from the library replaces the block's OCV points
    const origin = { origin: new URL(appUrl("/")).origin };
    const ocvText = "SOC [%],OCV [V]\n0,330\n50,365\n100,400\n";
    const ocvPreview = (await (await page.request.post(appUrl(`/api/workspaces/${workspaceId}/library/preview`), { data: { kind: "battery_ocv", text: ocvText }, headers: origin })).json()) as { confirmation: unknown };
    const savedOcv = await page.request.post(appUrl(`/api/workspaces/${workspaceId}/library`), {
      data: { kind: "battery_ocv", text: ocvText, confirmation: ocvPreview.confirmation, name: "bench OCV", source_note: "" }, headers: origin,
    });
    expect(savedOcv.status()).toBe(201);
    await page.reload();
    await page.locator('[data-connection="connected"]').waitFor();
    const batteryBlock = page.locator('[data-block-kind="battery_pack"]');
    await batteryBlock.locator('[data-field="ocv_library_id"] select').selectOption({ label: "bench OCV" });
    await batteryBlock.locator('[data-field="ocv_soc"]').waitFor({ state: "detached" });
    await page.locator('[data-block-kind="headline_figures"]').getByText("0.20 km in 30 s").waitFor();
    await screenshot(page, "library-05-document-uses-ocv");
    await gotoApp(page, `/w/${workspaceId}/library`);
    await page.getByRole("row", { name: /^depot/ }).getByText("used by 1 document").waitFor();
    await page.getByRole("row", { name: /bench OCV/ }).getByText("used by 1 document").waitFor();

    // export the results: traces CSV (3 intervals of 10 s), summary page, chart PNG
    const exportBase = appUrl(`/api/workspaces/${workspaceId}/documents/${documentId}/export`);
    const csv = await page.request.get(`${exportBase}/traces`);
    expect(csv.status()).toBe(200);
    const lines = (await csv.text()).trim().split("\n").filter((l) => !l.startsWith("#"));
    expect(lines.slice(1).map((l) => l.split(",")[0])).toEqual(["0", "10", "20"]);
    const summary = await page.request.get(`${exportBase}/summary`);
    expect(await summary.text()).toContain("0.200 km");
    const png = await page.request.get(`${exportBase}/charts/speed.png`);
    expect(png.headers()["content-type"]).toBe("image/png");

    // an API token, shown once, that evaluates a scenario
    await gotoApp(page, "/account/tokens");
    await page.getByLabel("Name").fill("nightly");
    await page.getByRole("button", { name: "Create token" }).click();
    const token = await page.getByTestId("new-token").innerText();
    expect(token).toMatch(/^jb_/);
    await screenshot(page, "tokens-01-created");
    const scenario = { format: "joulebook.scenario/1", name: "t", powertrain: "bev", cycle: { standard: "ece15" },
      vehicle: { mass_kg: 1500, rotating_mass_factor: 0.05, drag_coefficient: 0.3, frontal_area_m2: 2.2, rolling_resistance: 0.01, wheel_radius_m: 0.31 },
      driveline: { gear_ratios: [1], final_drive_ratio: 8, efficiency: 0.95 },
      motor: { peak_power_kw: 80, peak_torque_nm: 250, max_speed_rpm: 12000, efficiency: 0.9 },
      battery: { capacity_ah: 60, ocv: { soc: [0, 1], voltage_v: [330, 400] }, resistance_ohm: 0.1, soc_initial: 0.8, soc_min: 0.1, soc_max: 0.95, max_discharge_c: 5, max_charge_c: 3 } };
    const res = await fetch(appUrl("/api/evaluate"), { method: "POST", headers: { authorization: `Bearer ${token}`, "content-type": "application/json" }, body: JSON.stringify(scenario) });
    expect(res.status).toBe(200);

    // read-only (the document archived): the pickers show the items' names, not selects
    const archived = await page.request.post(appUrl(`/api/workspaces/${workspaceId}/documents/${documentId}/archive`), { headers: origin });
    expect(archived.ok()).toBe(true);
    await gotoApp(page, `/w/${workspaceId}/documents/${documentId}`);
    await page.locator('[data-connection="connected"]').waitFor();
    await page.locator('[data-block-kind="drive_cycle"] [data-field="library_id"]').getByText(/^depot/).waitFor();
    await page.locator('[data-block-kind="battery_pack"] [data-field="ocv_library_id"]').getByText("bench OCV").waitFor();
    expect(await page.locator('[data-field="library_id"] select, [data-field="ocv_library_id"] select').count()).toBe(0);
    expect(watch.take()).toEqual([]);
  });
});
