"use client";
// One vega-lite chart. The spec is embedded once (callers pass a constant or memoised spec);
// data goes in through named datasets and `view.data(name, rows).runAsync()`, so a live edit
// never re-embeds the chart. Loaded client-only through ./chart.tsx.
import { useEffect, useRef, useState } from "react";
import { VegaEmbed } from "react-vega";
import type { EmbedOptions, Result as EmbedResult, VisualizationSpec } from "vega-embed";

export type Datasets = Record<string, readonly object[]>;

// logLevel 1 = errors only: vega warns about empty extents before the first data arrives.
// Canvas: a recalculation redraws thousands of trace points, which SVG does markedly slower.
// Number format stated, not inherited: thousands with a plain comma and a dot for decimals, as
// in the rest of the product (tables use en-GB), whatever locale the browser runs in.
const FORMAT_LOCALE = { decimal: ".", thousands: ",", grouping: [3], currency: ["", ""], minus: "\u2212" };
const OPTIONS: EmbedOptions = { actions: false, renderer: "canvas", logLevel: 1, formatLocale: FORMAT_LOCALE };

export default function VegaView({ spec, datasets, label }: { spec: VisualizationSpec; datasets: Datasets; label: string }) {
  const [view, setView] = useState<EmbedResult["view"] | null>(null);
  const [error, setError] = useState<string | null>(null);
  const latest = useRef(datasets);
  latest.current = datasets;

  useEffect(() => {
    if (!view) return;
    let cancelled = false;
    for (const [name, rows] of Object.entries(datasets)) view.data(name, rows.slice() as object[]);
    view.runAsync().catch((e: unknown) => { if (!cancelled) setError(e instanceof Error ? e.message : String(e)); });
    return () => { cancelled = true; };
  }, [view, datasets]);

  return (
    <figure role="img" aria-label={label} className="w-full">
      <VegaEmbed
        spec={spec}
        options={OPTIONS}
        className="w-full"
        onEmbed={(result) => setView(result.view)}
        onError={(e) => setError(e instanceof Error ? e.message : String(e))}
      />
      {error ? <figcaption className="mt-2 text-sm text-danger">The chart could not be drawn: {error}</figcaption> : null}
    </figure>
  );
}
