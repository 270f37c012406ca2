import type { z } from "zod";
import { makeError, type PathPart, type ScenarioError } from "./errors";

type Issue = z.core.$ZodIssue;

function bound(issue: { minimum?: unknown; maximum?: unknown; inclusive?: boolean }, kind: "min" | "max"): string {
  const limit = kind === "min" ? issue.minimum : issue.maximum;
  const op = kind === "min" ? (issue.inclusive ? ">=" : ">") : issue.inclusive ? "<=" : "<";
  return `${op} ${String(limit)}`;
}

/** Turns one zod issue into our rule wording. */
function ruleOf(issue: Issue): string {
  switch (issue.code) {
    case "invalid_type": {
      const what = issue.expected === "int" ? "a whole number" : issue.expected === "number" ? "a finite number" : issue.expected === "object" ? "an object" : issue.expected === "array" ? "an array" : `a ${issue.expected}`;
      return issue.input === undefined ? `is required (${what})` : `must be ${what}`;
    }
    case "too_small":
      return issue.origin === "array" ? `needs at least ${String(issue.minimum)} items` : `must be ${bound(issue, "min")}`;
    case "too_big":
      return issue.origin === "array" ? `allows at most ${String(issue.maximum)} items` : `must be ${bound(issue, "max")}`;
    case "invalid_value":
      return `must be one of ${issue.values.map((v) => JSON.stringify(v)).join(", ")}`;
    case "invalid_union": {
      // zod reports the allowed discriminator values on `options` (not in its public type).
      const options = (issue as { options?: unknown[] }).options;
      return options ? `must be one of ${options.map((v) => JSON.stringify(v)).join(", ")}` : "does not match any allowed form";
    }
    case "unrecognized_keys":
      return `unknown field(s) ${issue.keys.map((k) => `"${k}"`).join(", ")}`;
    case "not_multiple_of":
      return `must be a multiple of ${String(issue.divisor)}`;
    default:
      return issue.message;
  }
}

export function fromZodIssues(input: unknown, issues: readonly Issue[]): ScenarioError[] {
  return issues.map((issue) => {
    const parts = issue.path.filter((p): p is PathPart => typeof p !== "symbol");
    if (issue.code === "invalid_type" && issue.expected === "number" && typeof issue.input === "number")
      return makeError(input, parts, "must be a finite number", issue.input);
    if (issue.code === "unrecognized_keys") return makeError(input, parts, ruleOf(issue), issue.keys);
    return makeError(input, parts, ruleOf(issue));
  });
}
