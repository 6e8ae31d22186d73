import { databaseUrl, closeDb } from "../db/client";
import { resetDatabase } from "../db/reset";
import { seedDemo } from "../db/seed";

/** npm run db:seed — resets the database to the demo scenario. `--if-empty` seeds only a fresh database. */
async function main() {
  const url = databaseUrl();
  if (process.argv.includes("--if-empty")) {
    const { getDb } = await import("../db/client");
    const { studios } = await import("../db/schema");
    const rows = await getDb().select({ id: studios.id }).from(studios).limit(1).catch(() => []);
    if (rows.length) {
      console.log("[placet] demo data already present (npm run db:seed resets it)");
      return;
    }
  }
  const started = Date.now();
  await closeDb();
  await resetDatabase(url);
  const ids = await seedDemo();
  console.log(`[placet] demo loaded in ${Date.now() - started} ms`, ids);
}

main()
  .then(() => closeDb())
  .catch(async (err) => {
    console.error("[placet] seeding failed:", err);
    await closeDb();
    process.exit(1);
  });
