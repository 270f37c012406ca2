/**
 * The demo workspace's documents: four architectures of a fictional 3.5 t urban delivery van,
 * each on our delivery route and on the NEDC (why both: lib/demo/van.ts, driveCycleNote).
 * Pure: builders return Y.Docs; the seed (scripts/seed/demo-documents.ts) stores them by name.
 */
import type * as Y from "yjs";
import type { PowertrainKind } from "@/lib/notebook/block-kinds";
import { buildBevVan } from "./bev";
import { buildDieselVan } from "./diesel";
import { buildParallelVan } from "./parallel";
import { buildSeriesVan } from "./series";
import type { DemoCycle } from "./van";
import { withResultViews } from "./result-views";

export type { DemoCycle } from "./van";
export { DELIVERY_ROUTE, sampleRoute, routeSpeedsText, routeFigures, type Phase, type Section, type SampledRoute } from "./delivery-route";

export interface DemoDocument {
  /** stable key for tests and benchmarks, e.g. "parallel-route" */
  key: `${PowertrainKind}-${DemoCycle}`;
  /** unique within the demo workspace; the seed finds existing documents by it */
  name: string;
  powertrain: PowertrainKind;
  cycle: DemoCycle;
  build(): Y.Doc;
}

const ARCHITECTURES: { powertrain: PowertrainKind; title: string; build: (cycle: DemoCycle, name: string) => Y.Doc }[] = [
  { powertrain: "conventional", title: "Van A · diesel baseline", build: buildDieselVan },
  { powertrain: "parallel", title: "Van B · parallel hybrid", build: buildParallelVan },
  { powertrain: "series", title: "Van C · range extender", build: buildSeriesVan },
  { powertrain: "bev", title: "Van D · battery-electric", build: buildBevVan },
];

const CYCLE_SUFFIX: Record<DemoCycle, string> = { route: "delivery route", nedc: "NEDC" };

export const DEMO_DOCUMENTS: readonly DemoDocument[] = (["route", "nedc"] as const).flatMap((cycle) =>
  ARCHITECTURES.map((a): DemoDocument => {
    const name = `${a.title} — ${CYCLE_SUFFIX[cycle]}`;
    return { key: `${a.powertrain}-${cycle}`, name, powertrain: a.powertrain, cycle, build: () => withResultViews(a.build(cycle, name), a.powertrain) };
  }),
);

/** The demo document with this key (throws for an unknown key: a typo in a test should fail loudly). */
export function demoDocument(key: DemoDocument["key"]): DemoDocument {
  const d = DEMO_DOCUMENTS.find((x) => x.key === key);
  if (!d) throw new Error(`no demo document with key ${key}`);
  return d;
}
