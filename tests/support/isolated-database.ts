// Runs before every integration test file: gives the file a database of its own, copied
// from the migrated template, so test files never see each other's rows.
import postgres from "postgres";
import { randomBytes } from "node:crypto";
import { afterAll } from "vitest";

const adminUrl = process.env.TEST_PG_ADMIN_URL;
const template = process.env.TEST_TEMPLATE_DB;
if (!adminUrl || !template) throw new Error("integration tests need TEST_PG_ADMIN_URL and TEST_TEMPLATE_DB: run them with `npm test`");

const name = `jb_test_${randomBytes(6).toString("hex")}`;
const admin = postgres(adminUrl, { max: 1, onnotice: () => {} });
await admin.unsafe(`create database ${name} template ${template}`);
const url = new URL(adminUrl);
url.pathname = `/${name}`;
process.env.DATABASE_URL = url.toString();

afterAll(async () => {
  const { closeDb } = await import("@/db/client");
  await closeDb();
  await admin.unsafe(`drop database if exists ${name} with (force)`);
  await admin.end();
});
