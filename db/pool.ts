// The connection pool, without the "server-only" marker so that plain Node processes
// (mail sink, seed script) can share the query modules. Next code imports "@/db/client".
import { drizzle, type PostgresJsDatabase } from "drizzle-orm/postgres-js";
import postgres from "postgres";
import * as schema from "./schema";

export type Db = PostgresJsDatabase<typeof schema>;
/** A transaction handle or the pool: query functions accept either. */
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0] | Db;

// One pool per process, created on first use so that tests can point DATABASE_URL
// at their own database before anything connects.
let sql: postgres.Sql | undefined;
let db: Db | undefined;

export function getDb(): Db {
  if (!db) {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error("DATABASE_URL is not set");
    sql = postgres(url, { max: 10, onnotice: () => {} });
    db = drizzle(sql, { schema });
  }
  return db;
}

export async function closeDb(): Promise<void> {
  await sql?.end({ timeout: 5 });
  sql = undefined;
  db = undefined;
}
