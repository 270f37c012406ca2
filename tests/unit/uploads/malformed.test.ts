import { describe, expect, it } from "vitest";
import { MALFORMED, type MalformedCase } from "@/tests/fixtures/uploads/malformed";
import { previewCycle, previewFullLoad, previewOcv, type UploadInput } from "@/lib/uploads";

function run(c: MalformedCase) {
  const input: UploadInput = c.bytes ? { bytes: new Uint8Array(c.bytes) } : { text: c.text ?? "" };
  if (c.kind === "cycle") return previewCycle(input);
  if (c.kind === "engine_full_load") return previewFullLoad(input);
  return previewOcv(input);
}

describe("malformed uploads are refused with line, column and message", () => {
  it("the corpus has at least 30 cases", () => {
    expect(MALFORMED.length).toBeGreaterThanOrEqual(30);
  });

  it.each(MALFORMED.map((c) => [c.name, c] as const))("%s", (_name, c) => {
    const r = run(c);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    // nothing valid comes back with a failed upload
    expect(r).not.toHaveProperty("cycle");
    expect(r).not.toHaveProperty("data");
    const first = r.issues[0];
    expect({ line: first.line, column: first.column, message: first.message }).toEqual({ line: c.line, column: c.column, message: c.message });
    expect(r.issues.length).toBe(c.count ?? 1);
  });
});
