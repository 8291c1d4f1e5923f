import { bigint, datetime } from "drizzle-orm/mysql-core";

/** Our own tables use unsigned auto-increment ids, read as JS numbers (safe below 2^53). */
export const id = () => bigint("id", { mode: "number", unsigned: true }).autoincrement().primaryKey();
export const refId = (name: string) => bigint(name, { mode: "number", unsigned: true });

/** Every instant is stored in UTC with millisecond precision (the pool runs with timezone "Z"). */
export const utc = (name: string) => datetime(name, { mode: "date", fsp: 3 });
export const createdAt = () =>
  utc("created_at")
    .notNull()
    .$defaultFn(() => new Date());
export const updatedAt = () =>
  utc("updated_at")
    .notNull()
    .$defaultFn(() => new Date())
    .$onUpdateFn(() => new Date());
