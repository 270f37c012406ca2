import { detectDelimiter, readTable, type Delimiter, type TableRow } from "./table";
import { detectDecimal, looksNumeric, type DecimalMark } from "./numbers";

/** How the file is laid out: what the user confirms before the numbers are read. */
export interface Layout {
  delimiter: Delimiter;
  decimal: DecimalMark;
  /** 0: numbers from the first row; 1: a header row; 2: a header row and a units row. */
  header_rows: 0 | 1 | 2;
  /** One name per column ("speed [km/h]"); "column 3" when the file has no header. */
  headers: string[];
}

const allText = (cells: string[]) => cells.every((c) => c === "" || !looksNumeric(c)) && cells.some((c) => c !== "");

/** Guesses the layout from the first rows. */
export function detectLayout(text: string): { layout: Layout; rows: TableRow[] } {
  const delimiter = detectDelimiter(text);
  const rows = readTable(text, delimiter);
  let header_rows: 0 | 1 | 2 = 0;
  if (rows.length > 0 && rows[0].cells.some((c) => c !== "" && !looksNumeric(c))) {
    header_rows = 1;
    if (rows.length > 1 && allText(rows[1].cells)) header_rows = 2;
  }
  const sample = rows.slice(header_rows, header_rows + 50).flatMap((r) => r.cells);
  const decimal = delimiter === "," ? "." : detectDecimal(sample);
  return { layout: { delimiter, decimal, header_rows, headers: headersOf(rows, header_rows) }, rows };
}

/** Column names from the header rows; a units row is folded in as "name [unit]". */
export function headersOf(rows: TableRow[], header_rows: number): string[] {
  const width = Math.max(0, ...rows.slice(0, header_rows + 1).map((r) => r.cells.length));
  const out: string[] = [];
  for (let c = 0; c < width; c++) {
    const name = header_rows >= 1 ? rows[0]?.cells[c] ?? "" : "";
    const unit = header_rows >= 2 ? rows[1]?.cells[c] ?? "" : "";
    const base = name !== "" ? name : `column ${c + 1}`;
    out.push(unit !== "" ? `${base} [${unit.replace(/^[[(]|[\])]$/g, "")}]` : base);
  }
  return out;
}
