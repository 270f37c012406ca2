"use client";
// Client-only entry for charts: react-vega has no "use client" and vega touches the DOM.
import dynamic from "next/dynamic";

export const Chart = dynamic(() => import("./vega-view"), {
  ssr: false,
  loading: () => <div className="h-40 animate-pulse rounded-control bg-paper-sunk" aria-hidden="true" />,
});
export type { Datasets } from "./vega-view";
