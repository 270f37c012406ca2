// POST /api/evaluate: the engine behind the route-handler wrapper (sign-in, 1 MiB cap, 422).
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import * as evaluateRoute from "@/app/api/evaluate/route";
import { bodyOf, call } from "./support/http";
import { newUser } from "./support/users";

const bev = JSON.parse(readFileSync("examples/bev.json", "utf8")) as Record<string, unknown>;
const post = (cookie: string | undefined, body?: unknown, rawBody?: string) =>
  call(evaluateRoute.POST, "POST", "/api/evaluate", { cookie, body, rawBody, headers: rawBody ? { "content-type": "application/json" } : {} });

describe("POST /api/evaluate", () => {
  it("needs a signed-in user (401)", async () => {
    expect((await post(undefined, bev)).status).toBe(401);
  });

  it("returns the Result of a valid scenario; its ledger closes (DESIGN §4: relative error < 1e-9)", async () => {
    const u = await newUser("eval");
    const res = await post(u.cookie, bev);
    expect(res.status).toBe(200);
    const result = await bodyOf(res);
    expect(result.kpi.distance_km).toBeGreaterThan(10.9); // NEDC is about 11.0 km (UNECE R83 Annex 4a)
    expect(result.kpi.distance_km).toBeLessThan(11.1);
    const supply = Math.abs(result.ledger_j.fuel) + Math.abs(result.ledger_j.battery_net);
    expect(Math.abs(result.closure_error_j) / supply).toBeLessThan(1e-9);
  });

  it("names the broken field in a 422", async () => {
    const u = await newUser("evalbad");
    const res = await post(u.cookie, { ...bev, vehicle: { ...(bev.vehicle as object), mass_kg: -5 } });
    expect(res.status).toBe(422);
    const body = await bodyOf(res);
    expect(Object.keys(body.fields)).toContain("vehicle.mass_kg");
    expect(body.errors[0]).toMatchObject({ path: "vehicle.mass_kg", value: -5 });
  });

  it("accepts bodies beyond the general 64 KiB cap, refuses over 1 MiB (413)", async () => {
    const u = await newUser("evalbig");
    const speeds = Array.from({ length: 12_000 }, (_, i) => 30 + 20 * Math.sin(i / 50)).map((v) => Number(v.toFixed(4)));
    const custom = { ...bev, cycle: { dt_s: 1, speed_kmh: [0, ...speeds, 0] } };
    expect(JSON.stringify(custom).length).toBeGreaterThan(64 * 1024);
    expect((await post(u.cookie, custom)).status).toBe(200);
    const huge = JSON.stringify({ ...bev, padding: "x".repeat(1024 * 1024) });
    expect((await post(u.cookie, undefined, huge)).status).toBe(413);
  });
});
