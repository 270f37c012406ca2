// Browser helpers for the e2e project: Debian's chromium driven by playwright-core, one
// persistent profile per simulated person (so cookies never mix), screenshots, console watch.
import { mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

// Flags from STACK.md: headless chromium as root in a container, with no background traffic.
const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export function appUrl(path = "/"): string {
  const base = process.env.APP_URL;
  if (!base) throw new Error("APP_URL is not set: run the e2e project through scripts/test.sh");
  return new URL(path, base).href;
}

export type Person = { context: BrowserContext; page: Page; close: () => Promise<void> };

export async function openPerson(): Promise<Person> {
  const profile = mkdtempSync(join(tmpdir(), "chromium-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: CHROMIUM_ARGS,
    viewport: { width: 1280, height: 860 },
  });
  context.setDefaultTimeout(15_000);
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

const screenshotDir = join(process.env.ARTIFACTS_DIR ?? "artifacts", "screenshots");

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(screenshotDir, { recursive: true });
  await page.screenshot({ path: join(screenshotDir, `${name}.png`), fullPage: true });
}
