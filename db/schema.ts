// Drizzle schema: every table of the product. Migrations in drizzle/ are generated from it.
export {};
