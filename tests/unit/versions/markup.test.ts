import { describe, expect, it } from "vitest";
import { createScenarioDoc, readDoc, readBlocks } from "@/lib/notebook";
import { anchorProblem, handleOf, isDetached, mentionedHandles, parameterKey, parseMarkup, resolveMentions, toHtml, toPlainText } from "@/lib/versions";

const members = [
  { userId: "u1", email: "erik@van.test", name: "Erik Editor" },
  { userId: "u2", email: "rita@van.test", name: "Rita Reviewer" },
  { userId: "u3", email: "rita@other.test", name: "Rita Other" },
];

describe("comment markup", () => {
  it("bold, italic, code, links and mentions become tokens; everything else stays text", () => {
    expect(parseMarkup("c_r is **optimistic**, see _the_ `0.008` at [tyre data](https://example.test/t) @erik.")).toEqual([
      { type: "text", text: "c_r is " },
      { type: "bold", text: "optimistic" },
      { type: "text", text: ", see " },
      { type: "italic", text: "the" },
      { type: "text", text: " " },
      { type: "code", text: "0.008" },
      { type: "text", text: " at " },
      { type: "link", text: "tyre data", href: "https://example.test/t" },
      { type: "text", text: " " },
      { type: "mention", text: "@erik", handle: "erik" },
      { type: "text", text: "." },
    ]);
  });

  it("snake_case names and e-mail addresses in text are not italic or mentions", () => {
    expect(parseMarkup("curb_mass_kg from a@b.test")).toEqual([{ type: "text", text: "curb_mass_kg from a@b.test" }]);
  });

  it("HTML is escaped, javascript: links are not links", () => {
    const html = toHtml('<img src=x onerror=alert(1)> **<b>** [x](javascript:alert(1))');
    expect(html).not.toMatch(/<img|<b>|href="javascript/);
    expect(html).toContain("&lt;img src=x onerror=alert(1)&gt;");
    expect(html).toContain("<strong>&lt;b&gt;</strong>");
  });

  it("plain text drops the marks and writes link targets out", () => {
    expect(toPlainText("**why** [data](https://x.test/a)")).toBe("why data (https://x.test/a)");
  });

  it("mentions resolve by full address or unambiguous local part", () => {
    expect(mentionedHandles("@Erik and @erik and @rita@van.test")).toEqual(["erik", "rita@van.test"]);
    expect(resolveMentions("@Erik, @rita (ambiguous), @rita@other.test, @nobody", members).map((m) => m.userId)).toEqual(["u1", "u3"]);
    expect(handleOf(members[0]!, members)).toBe("erik");
    expect(handleOf(members[1]!, members)).toBe("rita@van.test");
  });
});

describe("anchors", () => {
  const doc = createScenarioDoc("conventional", "Van");
  const snap = readDoc(doc);
  const body = readBlocks(doc).find((b) => b.kind === "body")!.id;

  it("shape checks name the problem", () => {
    expect(anchorProblem({ kind: "ledger_row", key: "rolling" })).toBeNull();
    expect(anchorProblem({ kind: "ledger_row", key: "tyres" })).toMatch(/"tyres" is not a ledger row/);
    expect(anchorProblem({ kind: "parameter", key: "nofield" })).toMatch(/blockId\/field/);
  });

  it("a thread on a block or parameter that is gone is detached; ledger rows never are", () => {
    expect(isDetached({ kind: "block", key: body }, snap)).toBe(false);
    expect(isDetached({ kind: "parameter", key: parameterKey(body, "mass") }, snap)).toBe(false);
    const without = { ...snap, blocks: snap.blocks.filter((b) => b.id !== body) };
    expect(isDetached({ kind: "block", key: body }, without)).toBe(true);
    expect(isDetached({ kind: "parameter", key: parameterKey(body, "mass") }, without)).toBe(true);
    expect(isDetached({ kind: "parameter", key: parameterKey(body, "no_such") }, snap)).toBe(true);
    expect(isDetached({ kind: "ledger_row", key: "rolling" }, without)).toBe(false);
  });
});
