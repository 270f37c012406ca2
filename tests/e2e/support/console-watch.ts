import type { Page } from "playwright-core";

// Collects console errors and uncaught page errors, each tagged with the page it happened on,
// so a test can assert "no console errors" after every step and name the page that had one.
export class ConsoleWatch {
  private errors: string[] = [];

  constructor(page: Page) {
    page.on("console", (message) => {
      if (message.type() === "error") this.errors.push(`${page.url()}: ${message.text()}`);
    });
    page.on("pageerror", (error) => this.errors.push(`${page.url()}: uncaught ${error.message}`));
  }

  /** Returns and forgets the errors seen since the last call. */
  take(): string[] {
    const seen = this.errors;
    this.errors = [];
    return seen;
  }
}
