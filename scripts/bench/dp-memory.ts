/**
 * Memory of one DP run in a fresh process (spawned by strategies.ts): peak RSS before and
 * after 1800 × 201 × 41 (tables + backward pass + forward simulation), in MB, as JSON.
 */
import { readFileSync } from "node:fs";
import { parseScenario, prepare, simulate } from "../../lib/engine/index";
import { isHybrid } from "../../lib/engine/strategies/optimising";
import { planDp } from "../../lib/engine/strategies/dp/solve";
import { syntheticCycle_kmh } from "./engine";

const raw = JSON.parse(readFileSync(new URL("../../examples/series.json", import.meta.url), "utf8"));
raw.cycle = { dt_s: 1, speed_kmh: syntheticCycle_kmh(1800) };
const parsed = parseScenario(raw);
if (!parsed.ok) throw new Error("invalid");
const { plant } = prepare(parsed.scenario);
if (!isHybrid(plant)) throw new Error("not a hybrid");
const before = process.resourceUsage().maxRSS / 1024;
const heapBefore = process.memoryUsage().heapUsed / 2 ** 20;
const plan = planDp(plant, { socPoints: 201, controlPoints: 41, socFinalMin: 0.5, socFinalMax: 0.501 });
simulate(plant, plan.strategy, 0.5);
const after = process.resourceUsage().maxRSS / 1024;
const heapAfter = process.memoryUsage().heapUsed / 2 ** 20;
process.stdout.write(JSON.stringify({ peakRssBefore_mb: before, peakRssAfter_mb: after, heapBefore_mb: heapBefore, heapAfter_mb: heapAfter }) + "\n");
