/**
 * The collaboration section of `npm run bench`: runs scripts/bench/collab.ts (which needs
 * PostgreSQL) in its own process, only when a test template database is available, i.e. under
 * `bash scripts/with-test-db.sh npm run bench`. Returns false when its targets were missed.
 */
import { spawnSync } from "node:child_process";

export function runCollabSection(): boolean {
  if (!process.env.TEST_TEMPLATE_DB) {
    console.log("collab: skipped (needs PostgreSQL: bash scripts/with-test-db.sh npm run bench)\n");
    return true;
  }
  const run = spawnSync(process.execPath, ["--import", "tsx", "scripts/bench/collab.ts"], { stdio: "inherit", env: { ...process.env, DATABASE_URL: "" } });
  console.log();
  return run.status === 0;
}
