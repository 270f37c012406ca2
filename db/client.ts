import "server-only";
// Next code imports the pool from here; the marker keeps it out of client bundles.
export { getDb, closeDb, type Db, type Tx } from "./pool";
