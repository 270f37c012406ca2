// Seeds the demo data. Idempotent: `npm run demo` and `npm test` run it every time.
//   node --import tsx scripts/seed.ts                  writes the demo data
//   node --import tsx scripts/seed.ts --print-signins  prints the URL and the sign-ins, writes nothing
// To seed more (documents, versions, ...): write scripts/seed/<thing>.ts exporting a function of
// SeedContext and add it to STEPS, after the steps whose ids it needs.
import { closeDb } from "../db/pool";
import { DEMO_PASSWORD, DEMO_USERS, DEMO_WORKSPACE_NAME, seedFoundation } from "./seed/foundation";
import { seedDemoDocuments } from "./seed/demo-documents";
import { seedDemoLibrary } from "./seed/demo-library";
import type { SeedContext, SeedStep } from "./seed/types";

const STEPS: SeedStep[] = [
  { name: "demo team and workspace", run: seedFoundation },
  { name: "demo van documents", run: seedDemoDocuments },
  { name: "demo team library", run: seedDemoLibrary },
];

function printSignins(): void {
  const url = process.env.APP_URL ?? `http://127.0.0.1:${process.env.APP_PORT ?? "3210"}`;
  const lines = [
    "",
    `  Joulebook: ${url}`,
    `  Demo workspace "${DEMO_WORKSPACE_NAME}" — every demo account uses the password: ${DEMO_PASSWORD}`,
    ...DEMO_USERS.map((u) => `    ${u.role.padEnd(9)} ${u.email.padEnd(20)} ${u.name}`),
    "",
  ];
  console.log(lines.join("\n"));
}

async function seed(): Promise<void> {
  const ctx: SeedContext = {};
  try {
    for (const step of STEPS) {
      await step.run(ctx);
      console.error(`[seed] ${step.name}: done`);
    }
  } finally {
    await closeDb();
  }
}

if (process.argv.includes("--print-signins")) printSignins();
else await seed();
