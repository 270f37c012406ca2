import { describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { example } from "./helpers";

const root = fileURLToPath(new URL("../../../", import.meta.url));

function cli(file: string) {
  return spawnSync(process.execPath, ["--import", "tsx", "server/evaluate-cli.ts", file], { cwd: root, encoding: "utf8", timeout: 60_000 });
}

describe("evaluate CLI", () => {
  it("prints only the Result JSON on stdout for a valid scenario", () => {
    const r = cli("examples/series.json");
    expect(r.status).toBe(0);
    expect(r.stderr).toBe("");
    const result = JSON.parse(r.stdout);
    expect(result.format).toBe("joulebook.result/1");
    expect(result.kpi.distance_km).toBeGreaterThan(11);
    expect(result.traces.soc.length).toBe(1180);
  }, 60_000);

  it("exits non-zero with the messages on stderr for an invalid scenario, and nothing on stdout", () => {
    const dir = mkdtempSync(join(tmpdir(), "jb-cli-"));
    const raw = example("conventional");
    raw.driveline.upshift_speeds_kmh = [15, 30, 50, 70, 90];
    raw.vehicle.mass_kg = 0;
    const file = join(dir, "bad.json");
    writeFileSync(file, JSON.stringify(raw));
    const r = cli(file);
    expect(r.status).not.toBe(0);
    expect(r.stdout).toBe("");
    expect(r.stderr).toContain("vehicle.mass_kg: must be > 0 (got 0)");
    const missing = cli(join(dir, "nope.json"));
    expect(missing.status).not.toBe(0);
    expect(missing.stderr).toMatch(/cannot read/);
  }, 60_000);
});
