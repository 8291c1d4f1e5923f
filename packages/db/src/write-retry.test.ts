// The write-retry wrapper createDb() puts around every top-level transaction (decision 010).
import { randomBytes } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import mysql from "mysql2/promise";
import { sql } from "drizzle-orm";
import { createDb, withWriteRetry, type Db } from "./client.ts";

const fakeDbError = (errno: number) => Object.assign(new Error(`errno ${errno}`), { errno });

describe("withWriteRetry", () => {
  it("runs the work again after a deadlock and returns its result", async () => {
    let calls = 0;
    const result = await withWriteRetry(async () => {
      calls++;
      if (calls < 3) throw new Error("Failed query", { cause: fakeDbError(1213) });
      return "done";
    }, { baseDelayMs: 1 });
    expect(result).toBe("done");
    expect(calls).toBe(3);
  });

  it("retries a lock-wait timeout too", async () => {
    let calls = 0;
    await withWriteRetry(async () => {
      if (++calls === 1) throw fakeDbError(1205);
    }, { baseDelayMs: 1 });
    expect(calls).toBe(2);
  });

  it("gives up after the bounded number of attempts and throws the last error", async () => {
    let calls = 0;
    await expect(
      withWriteRetry(async () => {
        calls++;
        throw fakeDbError(1213);
      }, { attempts: 4, baseDelayMs: 1 }),
    ).rejects.toMatchObject({ errno: 1213 });
    expect(calls).toBe(4);
  });

  it("never retries any other error", async () => {
    let calls = 0;
    await expect(
      withWriteRetry(async () => {
        calls++;
        throw fakeDbError(1062);
      }, { baseDelayMs: 1 }),
    ).rejects.toMatchObject({ errno: 1062 });
    expect(calls).toBe(1);
  });
});

describe("transactions from createDb", () => {
  let db: Db;
  let pool: ReturnType<typeof createDb>["pool"];
  let name: string;
  beforeAll(async () => {
    const base = new URL(process.env.TEST_DATABASE_URL!);
    name = `takeup_test_${randomBytes(5).toString("hex")}`;
    const admin = await mysql.createConnection({ uri: base.toString() });
    await admin.query(`CREATE DATABASE \`${name}\``);
    await admin.end();
    base.pathname = `/${name}`;
    ({ db, pool } = createDb(base.toString(), { connectionLimit: 4, writeRetry: { baseDelayMs: 5 } }));
    await db.execute(sql`create table probe (id int primary key, n int not null) engine=InnoDB`);
    await db.execute(sql`insert into probe values (1, 0), (2, 0)`);
  });
  afterAll(async () => {
    await pool.query(`DROP DATABASE \`${name}\``);
    await pool.end();
  });

  it("both finish when two transactions deadlock on rows taken in opposite order", async () => {
    // Each takes its first row, waits until the other has taken its own, then asks for the other's.
    let taken = 0;
    const bothTaken = () => new Promise<void>((resolve) => {
      const check = () => (taken >= 2 ? resolve() : setTimeout(check, 5));
      check();
    });
    const run = (first: number, second: number) =>
      db.transaction(async (tx) => {
        await tx.execute(sql`update probe set n = n + 1 where id = ${first}`);
        taken++;
        await bothTaken();
        await tx.execute(sql`update probe set n = n + 1 where id = ${second}`);
      });
    await Promise.all([run(1, 2), run(2, 1)]);
    const [rows] = await pool.query("select id, n from probe order by id");
    expect(rows).toEqual([{ id: 1, n: 2 }, { id: 2, n: 2 }]);
  });

  it("does not retry a savepoint on its own: the whole outer transaction starts over", async () => {
    let outer = 0;
    let inner = 0;
    await db.transaction(async (tx) => {
      outer++;
      await tx.transaction(async () => {
        inner++;
        if (inner === 1) throw fakeDbError(1213);
      });
    });
    expect({ outer, inner }).toEqual({ outer: 2, inner: 2 });
  });
});
