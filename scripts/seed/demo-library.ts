// Seed step: the demo workspace's team library — a delivery-van depot loop (synthetic, generated
// here: stop-and-go legs at 1 Hz), an engine full-load curve and a battery OCV curve, each put
// through the same upload pipeline as a user's file. Idempotent, keyed by name.
import { and, eq } from "drizzle-orm";
import { insertLibraryItem } from "../../db/library";
import { getDb } from "../../db/pool";
import { libraryItems } from "../../db/schema-library";
import { previewUpload } from "../../lib/library/preview";
import type { LibraryKind } from "../../lib/library/kinds";
import type { SeedContext } from "./types";

/** Legs of [cruise km/h, cruise s, stop s]; ramps at 1 m/s² up and 1.25 m/s² down (our choice). */
const LEGS: [number, number, number][] = [[30, 40, 20], [50, 90, 25], [25, 30, 40], [60, 120, 15], [40, 50, 30], [20, 25, 20]];

function depotLoopCsv(): string {
  const v: number[] = [0, 0, 0, 0, 0];
  for (const [cruise, hold, stop] of LEGS) {
    for (let s = 3.6; s < cruise; s += 3.6) v.push(Number(s.toFixed(1)));
    for (let k = 0; k < hold; k++) v.push(cruise);
    for (let s = cruise - 4.5; s > 0; s -= 4.5) v.push(Number(s.toFixed(1)));
    for (let k = 0; k < stop; k++) v.push(0);
  }
  return "time [s],speed [km/h]\n" + v.map((x, t) => `${t},${x}`).join("\n") + "\n";
}

const ITEMS: { kind: LibraryKind; name: string; source: string; text: string }[] = [
  { kind: "cycle", name: "Depot loop (demo)", source: "synthetic stop-and-go loop generated for the demo; not a measured or published cycle", text: depotLoopCsv() },
  {
    kind: "engine_full_load", name: "1.6 L petrol full load (demo)", source: "round numbers for the demo, not a real engine",
    text: "engine speed [rpm];torque [N·m]\n800;95\n1500;140\n2500;160\n3500;158\n4500;150\n5500;135\n6000;120\n",
  },
  {
    kind: "battery_ocv", name: "96s NMC pack OCV (demo)", source: "typical NMC cell shape × 96 in series, rounded; not from a cell maker",
    text: "SOC [%]\tOCV [V]\n0\t317\n10\t335\n20\t345\n40\t355\n60\t367\n80\t385\n90\t393\n100\t403\n",
  },
];

export async function seedDemoLibrary(ctx: SeedContext): Promise<void> {
  const workspaceId = ctx.demoWorkspaceId;
  const uploadedBy = ctx.userIds?.get("ben@example.com");
  if (!workspaceId || !uploadedBy) throw new Error("seed: the demo library needs the demo workspace and users (run the foundation step first)");
  for (const item of ITEMS) {
    const [existing] = await getDb().select({ id: libraryItems.id }).from(libraryItems)
      .where(and(eq(libraryItems.workspaceId, workspaceId), eq(libraryItems.name, item.name))).limit(1);
    if (existing) continue;
    const p = previewUpload(item.kind, { text: item.text });
    if (!p.ok) throw new Error(`seed: demo library item "${item.name}" does not pass the upload checks: ${p.issues.map((i) => i.message).join("; ")}`);
    await insertLibraryItem({ workspaceId, kind: item.kind, name: item.name, sourceNote: item.source, data: p.data, summary: { ...p.summary, warnings: p.warnings }, uploadedBy });
  }
}
