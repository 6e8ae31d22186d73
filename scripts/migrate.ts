import { runMigrations } from "../db/migrate";
import { appDatabaseUrl, appUser, migratorUrl } from "../db/urls";

// npm run db:migrate — DDL as the migrator (MIGRATOR_URL), then the app's user (DATABASE_URL) gets its grants.
const url = appDatabaseUrl();
const started = Date.now();
runMigrations(url)
  .then(({ tables }) => {
    const as = decodeURIComponent(new URL(migratorUrl(url)).username);
    console.log(`[placet] migrations applied as ${as} in ${Date.now() - started} ms; ${appUser(url)} may use ${tables} tables (trail_events: SELECT, INSERT only)`);
  })
  .catch((err) => {
    console.error("[placet] migration failed:", err.message ?? err);
    process.exit(1);
  });
