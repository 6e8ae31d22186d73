import { defineConfig } from "drizzle-kit";
import { migratorUrl } from "./db/urls";

export default defineConfig({
  dialect: "mysql",
  schema: "./db/schema.ts",
  out: "./db/migrations",
  // DDL is the migrator's (the app's own user may not create or alter tables).
  dbCredentials: { url: migratorUrl() },
});
