// Engine findings name a Scenario component; the notebook shows each next to the block that
// writes that component.
import type { Finding } from "@/lib/engine";
import type { BlockKind } from "@/lib/notebook";

const KIND_OF_COMPONENT: Record<string, BlockKind> = {
  cycle: "drive_cycle",
  vehicle: "body",
  driveline: "driveline",
  engine: "engine",
  motor: "electric_machine",
  generator: "generator_set",
  battery: "battery_pack",
  strategy: "energy_manager",
};

export function blockKindOfFinding(finding: Pick<Finding, "component">): BlockKind | null {
  return KIND_OF_COMPONENT[finding.component] ?? null;
}

/** Findings grouped by the id of the first block of the matching kind; the rest under "". */
export function findingsByBlock(findings: readonly Finding[], blocks: readonly { id: string; kind: BlockKind }[]): Map<string, Finding[]> {
  const firstOfKind = new Map<BlockKind, string>();
  for (const b of blocks) if (!firstOfKind.has(b.kind)) firstOfKind.set(b.kind, b.id);
  const out = new Map<string, Finding[]>();
  for (const f of findings) {
    const kind = blockKindOfFinding(f);
    const id = (kind && firstOfKind.get(kind)) ?? "";
    out.set(id, [...(out.get(id) ?? []), f]);
  }
  return out;
}
