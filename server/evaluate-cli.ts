/**
 * `npm run --silent evaluate -- scenario.json`: prints the Result JSON on stdout and
 * nothing else; an unreadable or invalid scenario exits 1 (2 for usage) with the
 * message(s) on stderr, one per line. Reads stdin when the file is "-".
 * `--step-ledger` adds the per-step ledger (W) to the Result.
 */
import { readFileSync } from "node:fs";
import { evaluateScenarioInput } from "../lib/engine/index";

function fail(code: number, lines: string[]): never {
  process.stderr.write(lines.join("\n") + "\n");
  process.exit(code);
}

function main(argv: string[]): void {
  const stepLedger = argv.includes("--step-ledger");
  const args = argv.filter((a) => a !== "--" && a !== "--step-ledger");
  if (args.length !== 1) fail(2, ["usage: npm run --silent evaluate -- [--step-ledger] scenario.json   (or - for stdin)"]);
  const file = args[0];
  let text: string;
  try {
    text = readFileSync(file === "-" ? 0 : file, "utf8");
  } catch (err) {
    fail(1, [`${file}: cannot read (${(err as NodeJS.ErrnoException).code ?? String(err)})`]);
  }
  let input: unknown;
  try {
    input = JSON.parse(text);
  } catch (err) {
    fail(1, [`${file}: not valid JSON (${(err as Error).message})`]);
  }
  const outcome = evaluateScenarioInput(input, { stepLedger });
  if (!outcome.ok) fail(1, [`${file}: invalid scenario`, ...outcome.errors.map((e) => `  ${e.message}`)]);
  process.stdout.write(JSON.stringify(outcome.result) + "\n");
}

// A reader that stops early (`| head -c 400`) closes the pipe: that is not an error of ours.
process.stdout.on("error", (err: NodeJS.ErrnoException) => {
  if (err.code === "EPIPE") process.exit(0);
  throw err;
});

main(process.argv.slice(2));
