/**
 * `npm run bench`: each section prints its own table. Later sections (e.g. DP, ECMS) add
 * a module under scripts/bench/ and one call below.
 */
import { printEngineSection } from "./bench/engine";
import { printStrategiesSection } from "./bench/strategies";
import { runCollabSection } from "./bench/collab-section";

console.log(`node ${process.version}, ${new Date().toISOString()}\n`);
const results = [printEngineSection(), printStrategiesSection(), runCollabSection()];
if (results.some((ok) => !ok)) process.exitCode = 1;
