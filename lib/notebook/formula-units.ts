import { UNITS, type UnitDef } from "./unit-table";
import { toSI } from "./units";

/**
 * Inside a formula a number may carry a unit ("base_mass + 100 kg", "2 * 25 kW"). expr-eval
 * knows no units, so each such literal is replaced by a generated name ("_0", "_1", …; user
 * names cannot start with "_") whose value is the literal in SI. `origin[i]` maps every
 * character of the rewritten text back to its index in the original, so parse-error columns
 * still point at what the user typed.
 */
export interface UnitLiteral {
  name: string;
  value_si: number;
  unit: UnitDef;
}

export interface Rewritten {
  text: string;
  origin: number[];
  literals: UnitLiteral[];
}

// every spelling of every unit, longest first, so "km/h" wins over "km" and "m/s²" over "m"
const SPELLINGS: { spelling: string; unit: UnitDef }[] = UNITS.filter((u) => u.symbol !== "")
  .flatMap((u) => [u.symbol, ...(u.aliases ?? [])].map((spelling) => ({ spelling, unit: u })))
  .sort((a, b) => b.spelling.length - a.spelling.length);

const NUMBER_AT = /(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][-+]?\d+)?/y;

function unitAt(text: string, start: number): { unit: UnitDef; length: number } | undefined {
  for (const { spelling, unit } of SPELLINGS) {
    const candidate = text.slice(start, start + spelling.length);
    if (candidate !== spelling) continue;
    const next = text.charAt(start + spelling.length);
    if (/[A-Za-z0-9_²³]/.test(next)) continue;
    return { unit, length: spelling.length };
  }
  return undefined;
}

export function rewriteUnitLiterals(text: string): Rewritten {
  let out = "";
  const origin: number[] = [];
  const literals: UnitLiteral[] = [];
  let i = 0;
  while (i < text.length) {
    const prev = i > 0 ? text.charAt(i - 1) : "";
    NUMBER_AT.lastIndex = i;
    const num = /[A-Za-z0-9_.]/.test(prev) ? null : NUMBER_AT.exec(text);
    if (num) {
      const end = i + num[0].length;
      const gap = /^[ \t]*/.exec(text.slice(end))![0].length;
      const hit = unitAt(text, end + gap);
      if (hit) {
        const name = `_${literals.length}`;
        literals.push({ name, unit: hit.unit, value_si: toSI(Number(num[0]), hit.unit) });
        for (const ch of name) { out += ch; origin.push(i); }
        i = end + gap + hit.length;
        continue;
      }
      for (let k = i; k < end; k++) { out += text.charAt(k); origin.push(k); }
      i = end;
      continue;
    }
    out += text.charAt(i);
    origin.push(i);
    i += 1;
  }
  origin.push(text.length);
  return { text: out, origin, literals };
}
