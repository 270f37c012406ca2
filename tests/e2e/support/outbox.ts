import type { Page } from "playwright-core";
import { gotoApp } from "./flows";

/**
 * Opens the development outbox and returns the first link in the newest mail to `to` whose
 * href contains `hrefPart` (e.g. "/invite/"). The outbox page must be on (JOULEBOOK_OUTBOX=1).
 */
export async function linkFromOutbox(page: Page, to: string, hrefPart: string): Promise<string> {
  await gotoApp(page, "/dev/outbox");
  const mail = page.getByRole("article").filter({ hasText: to }).first();
  await mail.waitFor();
  const href = await mail.locator(`a[href*="${hrefPart}"]`).first().getAttribute("href");
  if (!href) throw new Error(`no link containing ${hrefPart} in the mail to ${to}`);
  return href;
}
