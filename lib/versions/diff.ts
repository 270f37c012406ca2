// The whole comparison of two versions (or a version and the live document).
import { diffBlocks } from "./blocks-diff";
import { kpiDeltas, ledgerDeltas, waterfall } from "./figures-diff";
import { overlayTraces } from "./traces-diff";
import type { NotebookDiff, VersionSide } from "./types";
import { EvaluatedDoc } from "./values";

export function diffVersions(a: VersionSide, b: VersionSide): NotebookDiff {
  const blocks = diffBlocks(new EvaluatedDoc(a.doc), new EvaluatedDoc(b.doc));
  const both = a.summary && b.summary ? { a: a.summary, b: b.summary } : null;
  const any = a.summary || b.summary;
  return {
    from: a.label,
    to: b.label,
    meta: {
      name: a.doc.name !== b.doc.name ? { from: a.doc.name, to: b.doc.name } : null,
      powertrain: a.doc.powertrain !== b.doc.powertrain ? { from: a.doc.powertrain, to: b.doc.powertrain } : null,
    },
    blocks,
    counts: {
      added: blocks.filter((x) => x.status === "added").length,
      removed: blocks.filter((x) => x.status === "removed").length,
      moved: blocks.filter((x) => x.moved).length,
      changed: blocks.filter((x) => x.status === "changed").length,
    },
    kpi: any ? kpiDeltas(a.summary, b.summary) : null,
    ledger: any ? ledgerDeltas(a.summary, b.summary) : null,
    waterfall: both ? waterfall(both.a, both.b) : null,
    traces: any ? overlayTraces(a.summary, b.summary) : null,
  };
}
