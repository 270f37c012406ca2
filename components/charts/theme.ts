// Chart colours and type from the app's tokens (tailwind.config.ts): one hue per energy path.
import type { Config } from "vega-lite";

export const INK = "#1e1b16";
export const MUTED = "#6a6254";
export const RULE = "#d9cfbd";
export const FUEL = "#a8501a";
export const ELECTRIC = "#1b6a80";
export const LOSS = "#8a3a5c";
export const ROAD = "#5d6b3a";
export const AUX = "#8a6200";
export const UNMET = "#a5281b";
export const OK = "#2e6b45";

export const GROUP_DOMAIN = ["fuel", "electric", "road", "loss", "aux", "unmet"];
export const GROUP_RANGE = [FUEL, ELECTRIC, ROAD, LOSS, AUX, UNMET];
export const GROUP_TITLES = ["fuel", "electric", "road load (work on the road)", "losses (heat)", "auxiliaries", "unmet demand"];

export const CHART_CONFIG: Config = {
  background: null as unknown as string,
  font: "inherit",
  view: { stroke: null },
  axis: { labelColor: MUTED, titleColor: INK, gridColor: RULE, domainColor: RULE, tickColor: RULE, labelFontSize: 11, titleFontSize: 11, titleFontWeight: 600 },
  legend: { labelColor: INK, titleColor: INK, labelFontSize: 11, titleFontSize: 11 },
  header: { labelColor: INK, labelFontSize: 11, labelFontWeight: 600, titleColor: INK },
};
