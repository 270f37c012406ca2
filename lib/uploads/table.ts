import Papa from "papaparse";

export type Delimiter = "," | ";" | "\t" | "|";
export const DELIMITERS: readonly Delimiter[] = [",", ";", "\t", "|"];

/** One non-blank row of the file with the line it starts on (1-based). */
export interface TableRow {
  line: number;
  cells: string[];
}

/** Offsets at which each line starts, for mapping parser offsets back to lines. */
function lineStarts(text: string): number[] {
  const starts = [0];
  for (let i = 0; i < text.length; i++) if (text.charCodeAt(i) === 10) starts.push(i + 1);
  return starts;
}

function lineOfOffset(starts: number[], offset: number): number {
  let lo = 0, hi = starts.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (starts[mid] <= offset) lo = mid;
    else hi = mid - 1;
  }
  return lo + 1;
}

/** Comment lines start with '#'; they and blank lines are skipped. */
const isSkipped = (line: string) => line.trim() === "" || line.trimStart().startsWith("#");

/**
 * Picks the delimiter that splits the first lines into the same number of cells (more
 * than one). Ties prefer tab, then semicolon (files with decimal commas use it), then
 * comma, then bar. No consistent candidate: the one with the most cells on the first line.
 */
export function detectDelimiter(text: string): Delimiter {
  const lines = text.split(/\r?\n/).filter((l) => !isSkipped(l)).slice(0, 20);
  const preference: Delimiter[] = ["\t", ";", ",", "|"];
  let fallback: Delimiter = ",", fallbackCount = 0;
  for (const d of preference) {
    const counts = lines.map((l) => l.split(d).length - 1);
    if (counts.length > 0 && counts[0] > 0 && counts.every((c) => c === counts[0])) return d;
    if (counts[0] > fallbackCount) { fallback = d; fallbackCount = counts[0]; }
  }
  return fallback;
}

/** Splits the text into rows with their line numbers; quoted cells may hold delimiters. */
export function readTable(text: string, delimiter: Delimiter): TableRow[] {
  const starts = lineStarts(text);
  const rows: TableRow[] = [];
  Papa.parse<string[]>(text, {
    delimiter,
    comments: "#",
    step: (r) => {
      const cells = r.data;
      if (cells.length === 1 && cells[0].trim() === "") return;
      // the cursor points past the row's line break; the row ends on the line before it
      let end = r.meta.cursor - 1;
      while (end > 0 && (text[end] === "\n" || text[end] === "\r")) end--;
      const endLine = lineOfOffset(starts, Math.max(0, end));
      const inner = cells.reduce((n, c) => n + (c.match(/\n/g)?.length ?? 0), 0);
      rows.push({ line: endLine - inner, cells: cells.map((c) => c.trim()) });
    },
  });
  return rows;
}
