// Fonts for the server-side PNG rasteriser. resvg reads TrueType/OpenType only (the app's
// fontsource files are woff2), so Inter ships as TTF in an npm package and the system's fonts
// are never consulted: a PNG looks the same on every machine, and a missing font is an error
// here rather than silently blank text.
import { existsSync } from "node:fs";
import { join } from "node:path";

/** The family name inside the TTF files (their `name` table); the SVG must ask for exactly this. */
export const EXPORT_FONT_FAMILY = "Inter";

// Regular for labels, SemiBold for axis titles (titleFontWeight 600 in the export theme).
const FILES = ["400Regular/Inter_400Regular.ttf", "600SemiBold/Inter_600SemiBold.ttf"];

/**
 * Absolute paths of the shipped TTF files. Resolved from the working directory, which is the
 * repository root for `next start`, the scripts and vitest (a bundled server chunk has no stable
 * path of its own to resolve from).
 */
export function exportFontFiles(root: string = process.cwd()): string[] {
  const dir = join(root, "node_modules", "@expo-google-fonts", "inter");
  const paths = FILES.map((f) => join(dir, f));
  const missing = paths.filter((p) => !existsSync(p));
  if (missing.length > 0) throw new Error(`export fonts missing: ${missing.join(", ")} (run npm ci in ${root})`);
  return paths;
}
