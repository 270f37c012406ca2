/**
 * A problem found in an upload, located by line (1-based, as an editor shows it) and
 * column (1-based). `null` where the problem is not tied to one line or column.
 */
export interface UploadIssue {
  line: number | null;
  column: number | null;
  column_name: string | null;
  message: string;
}

export function issue(message: string, line: number | null = null, column: number | null = null, column_name: string | null = null): UploadIssue {
  return { line, column, column_name, message };
}

/** "line 7, column 2 (speed [km/h]): 'abc' is not a number" */
export function formatIssue(i: UploadIssue): string {
  const where: string[] = [];
  if (i.line !== null) where.push(`line ${i.line}`);
  if (i.column !== null) where.push(`column ${i.column}${i.column_name ? ` (${i.column_name})` : ""}`);
  return where.length > 0 ? `${where.join(", ")}: ${i.message}` : i.message;
}

export type Outcome<T> = { ok: true; value: T; warnings: string[] } | { ok: false; issues: UploadIssue[] };

/** Collects issues, keeping the list short enough to read. */
export class IssueList {
  readonly items: UploadIssue[] = [];
  private dropped = 0;
  constructor(private readonly cap: number) {}

  add(i: UploadIssue): void {
    if (this.items.length < this.cap) this.items.push(i);
    else this.dropped++;
  }

  get count(): number {
    return this.items.length + this.dropped;
  }

  /** The list, with a closing line counting what was left out. */
  result(): UploadIssue[] {
    if (this.dropped === 0) return this.items;
    return [...this.items, issue(`and ${this.dropped} more problem${this.dropped === 1 ? "" : "s"} not listed`)];
  }
}
