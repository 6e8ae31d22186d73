import { bigint, customType, datetime } from "drizzle-orm/mysql-core";

/**
 * JSON stored as LONGTEXT and parsed here (MariaDB hands JSON columns back as strings), typed with the
 * domain shape it holds, e.g. json<FontParameters>("params"), so readers need no casts.
 */
export const json = <T>(name: string) =>
  customType<{ data: T; driverData: string }>({
    dataType: () => "longtext",
    toDriver: (value) => JSON.stringify(value),
    fromDriver: (value) => (typeof value === "string" ? JSON.parse(value) : value) as T,
  })(name);

/** Auto-increment key MariaDB accepts (drizzle's serial() emits SQL it rejects). */
export const id = () => bigint("id", { mode: "number", unsigned: true }).autoincrement().primaryKey();
export const ref = (name: string) => bigint(name, { mode: "number", unsigned: true });

/** UTC instant with millisecond precision; the server runs with time zone +00:00. */
export const utc = (name: string) => datetime(name, { mode: "date", fsp: 3 });
