// Server-side rendering of export charts: vega-lite → vega → headless View → SVG; PNG from that
// SVG with resvg (a prebuilt binary shipped as an npm package; no canvas, no browser).
import { compile, type TopLevelSpec } from "vega-lite";
import { parse, View } from "vega";
import { Resvg } from "@resvg/resvg-js";
import { EXPORT_FONT_FAMILY, exportFontFiles } from "./fonts";

export async function renderSvg(spec: TopLevelSpec): Promise<string> {
  const view = new View(parse(compile(spec).spec), { renderer: "none" });
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}

/** PNG at `scale` × the SVG's size (2 gives crisp print and retina images), text in the shipped Inter. */
export function svgToPng(svg: string, scale = 2): Uint8Array {
  const font = { fontFiles: exportFontFiles(), loadSystemFonts: false, defaultFontFamily: EXPORT_FONT_FAMILY, sansSerifFamily: EXPORT_FONT_FAMILY };
  const resvg = new Resvg(svg, { fitTo: { mode: "zoom", value: scale }, font });
  return new Uint8Array(resvg.render().asPng());
}
