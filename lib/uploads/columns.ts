import { IssueList, issue } from "./issues";
import { readNumber } from "./numbers";
import type { Layout } from "./layout";
import type { TableRow } from "./table";

/** A column to read: `column` is 1-based, as shown to the user. */
export interface ColumnSpec<K extends string> {
  key: K;
  column: number;
}

export interface ReadColumns<K extends string> {
  /** Line of each data row. */
  lines: number[];
  values: Record<K, number[]>;
}

/**
 * Reads the chosen columns of every data row as numbers. Ragged rows (a cell count other
 * than the header's, or the first data row's without a header) and unreadable cells are
 * reported with their line and column; rows with problems are still counted so that later
 * checks keep the line numbers right.
 */
export function readColumns<K extends string>(
  rows: TableRow[], layout: Layout, specs: ColumnSpec<K>[], issues: IssueList,
): ReadColumns<K> {
  const data = rows.slice(layout.header_rows);
  const width = layout.header_rows > 0 ? rows[0].cells.length : data[0]?.cells.length ?? 0;
  const widthFrom = layout.header_rows > 0 ? `the header on line ${rows[0].line} has ${width}` : `the first row (line ${data[0]?.line}) has ${width}`;
  const values = Object.fromEntries(specs.map((s) => [s.key, [] as number[]])) as Record<K, number[]>;
  const lines: number[] = [];
  for (const spec of specs)
    if (spec.column < 1 || spec.column > width)
      issues.add(issue(`the ${spec.key} column is set to column ${spec.column}, but the file has ${width} column${width === 1 ? "" : "s"}`));
  if (issues.count > 0) return { lines, values };
  for (const row of data) {
    lines.push(row.line);
    if (row.cells.length !== width) {
      issues.add(issue(`${row.cells.length} cell${row.cells.length === 1 ? "" : "s"}; ${widthFrom}`, row.line));
      for (const s of specs) values[s.key].push(NaN);
      continue;
    }
    for (const s of specs) {
      const cell = readNumber(row.cells[s.column - 1], layout.decimal);
      if (!cell.ok) issues.add(issue(cell.message, row.line, s.column, layout.headers[s.column - 1] ?? null));
      values[s.key].push(cell.ok ? cell.value : NaN);
    }
  }
  return { lines, values };
}
