// The demo library seed: its items pass the upload checks, and running it twice adds nothing.
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { libraryItems } from "@/db/schema-library";
import { seedFoundation } from "@/scripts/seed/foundation";
import { seedDemoLibrary } from "@/scripts/seed/demo-library";
import type { SeedContext } from "@/scripts/seed/types";

describe("demo library seed", () => {
  it("adds a depot loop, a full-load curve and an OCV curve once", async () => {
    const ctx: SeedContext = {};
    await seedFoundation(ctx);
    await seedDemoLibrary(ctx);
    await seedDemoLibrary(ctx);
    const rows = await getDb().select().from(libraryItems).where(eq(libraryItems.workspaceId, ctx.demoWorkspaceId!));
    expect(rows.map((r) => r.kind).sort()).toEqual(["battery_ocv", "cycle", "engine_full_load"]);
    const loop = rows.find((r) => r.kind === "cycle")!;
    const data = loop.data as { dt_s: number; speed_kmh: number[] };
    expect(data.dt_s).toBe(1);
    // legs cruise at 30/50/25/60/40/20 km/h: the top speed is the 60 km/h leg
    expect(Math.max(...data.speed_kmh)).toBe(60);
    expect(data.speed_kmh[0]).toBe(0);
    expect(data.speed_kmh[data.speed_kmh.length - 1]).toBe(0);
  });
});
