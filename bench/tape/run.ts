// The tape benchmark: the stock screen's query over 200 products with 1,000,000 movements behind
// them (on hand and average cost are kept on the product row, so the read never touches the
// movements), and the planner for 500 songs × 5 takes.
// `npx tsx bench/tape/run.ts [--movements=1000000] [--products=200] [--no-doc]`.
import os from "node:os";
import { asc, desc } from "drizzle-orm";
import type { RowDataPacket } from "mysql2/promise";
import { createDb, tapeProducts } from "@takeup/db";
import { migrateDatabase } from "@takeup/db/migrate";
import { seedDemo } from "@takeup/db/seed";
import { planTape } from "@takeup/domain";
import { benchFlag, benchOption as option, hostMachine, runBenchmark, sayAs, writeDocSection, type BenchContext } from "../lib/bench-run.ts";

/** Clear of the dev database (3307), the test databases (3308, 3310) and the other benches (3309, 3320). */
const port = 3321;
const movements = Number((option("movements") ?? "1000000").replaceAll("_", ""));
const productCount = Number(option("products") ?? 200);
const writeTheDoc = !benchFlag("no-doc");
const say = sayAs("bench:tape");

const quantile = (sorted: number[], q: number) => sorted[Math.min(sorted.length - 1, Math.ceil(q * sorted.length) - 1)]!;
const ms = (n: number) => `${n.toFixed(2)} ms`;

async function timeIt(runs: number, work: () => Promise<unknown> | unknown) {
  for (let i = 0; i < 5; i++) await work();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    await work();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return { p50: quantile(times, 0.5), p95: quantile(times, 0.95), max: times.at(-1)! };
}

async function main({ startServer }: BenchContext) {
  const mariadb = await startServer();
  await migrateDatabase(mariadb.url);
  const { db, pool } = createDb(mariadb.url);
  try {
    await seedDemo(db);
    const [[manager]] = await pool.query<RowDataPacket[]>("SELECT id FROM user WHERE email = 'manager@wrenfield.test'");
    const widths = ["0.25", "0.5", "1", "2"];
    const productRows = Array.from({ length: productCount }, (_, i) => [`BENCH-${i}`, `Bench tape ${i}`, widths[i % 4], 2500, "10.5", "fixed", 30_000, 5, 1000, 25_000_000, 25_000, new Date(), new Date()]);
    await pool.query("INSERT INTO tape_products (sku, name, width_inches, length_ft, reel_inches, price_mode, fixed_price_cents, reorder_point, on_hand, value_cents, average_cost_cents, created_at, updated_at) VALUES ?", [productRows]);
    const [ids] = await pool.query<RowDataPacket[]>("SELECT id FROM tape_products WHERE sku LIKE 'BENCH-%' ORDER BY id");
    const loadStart = performance.now();
    const batch = 5000;
    for (let done = 0; done < movements; done += batch) {
      const rows = [];
      for (let i = done; i < Math.min(movements, done + batch); i++) {
        const sale = i % 3 !== 0;
        rows.push([ids[i % ids.length]!.id, sale ? "sale" : "receipt", sale ? -1 : 3, 25_000, sale ? -25_000 : 75_000, sale ? 25_000 : null, sale ? 30_000 : null, sale ? 30_000 : null, "Bench tape", 100, 25_000, manager!.id, new Date(Date.UTC(2026, 0, 1) + i * 1000)]);
      }
      await pool.query(
        "INSERT INTO tape_movements (product_id, kind, quantity, unit_cost_cents, value_change_cents, cost_of_goods_cents, unit_price_cents, amount_cents, description, on_hand_after, average_cost_after_cents, created_by_user_id, created_at) VALUES ?",
        [rows],
      );
    }
    say(`loaded ${movements.toLocaleString("en-US")} movements for ${productCount} products in ${((performance.now() - loadStart) / 1000).toFixed(1)} s`);
    await pool.query("ANALYZE TABLE tape_products, tape_movements");

    // The stock screen's read, as the service runs it: one ordered select of the product rows.
    const stock = await timeIt(200, () => db.select().from(tapeProducts).orderBy(desc(tapeProducts.active), asc(tapeProducts.sku)));
    const songs = Array.from({ length: 500 }, (_, i) => ({ title: `Song ${i + 1}`, minutes: 2 + ((i * 37) % 400) / 60, takes: 5 }));
    const planner = await timeIt(50, () => planTape({ songs, speedIps: 15, reelLengthFt: 2500 }));
    const plan = planTape({ songs, speedIps: 15, reelLengthFt: 2500 });
    const [[server]] = await pool.query<RowDataPacket[]>("SELECT VERSION() AS version");
    say(`stock query p50 ${ms(stock.p50)}, p95 ${ms(stock.p95)}; planner p50 ${ms(planner.p50)}, p95 ${ms(planner.p95)} (${plan.reelsNeeded} reels)`);
    if (writeTheDoc) {
      const machine = hostMachine();
      writeDocSection(
        "tape",
        [
          "## Tape stock and planner (`bench/tape`)",
          "",
          `${productCount} products with ${movements.toLocaleString("en-US")} movements behind them. On hand, value and average cost live on the product row, kept by every movement (decision 014), so the stock screen's query reads ${productCount} rows and never the movements.`,
          "",
          "| measure | target | p50 | p95 | max |",
          "|---|---|---|---|---|",
          `| stock screen query (200 runs) | p95 < 20 ms | ${ms(stock.p50)} | ${ms(stock.p95)} | ${ms(stock.max)} |`,
          `| planner, 500 songs × 5 takes at 15 in/s on 2500 ft (${plan.reelsNeeded} reels; 50 runs) | < 50 ms | ${ms(planner.p50)} | ${ms(planner.p95)} | ${ms(planner.max)} |`,
          "",
          `Machine: ${machine.cpus}, ${machine.memory}, ${machine.os}, Node ${machine.node}, MariaDB ${String(server!.version)}; load average ${os.loadavg()[0]!.toFixed(1)} during the run (other work shared the cores); ${new Date().toISOString().slice(0, 10)}.`,
        ].join("\n"),
      );
    }
  } finally {
    await pool.end();
  }
}

await runBenchmark({ port, say }, main);
