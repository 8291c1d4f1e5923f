import path from "node:path";
import { fileURLToPath } from "node:url";
import { z } from "zod";

export type AppConfig = {
  appUrl: string;
  authSecret: string;
  smtpUrl: string;
  mailFrom: string;
  /** The local mail catcher's HTTP address: set in development and tests only. */
  mailCatcherUrl?: string;
  /** The built web app to serve beside /api; absent in API tests and in `npm run dev`. */
  webDist?: string;
  trustProxy: boolean;
  /** Parse every answer against its route contract (on by default under NODE_ENV=test). */
  checkResponses?: boolean;
  /** Where uploaded files (tape receipts) are kept, outside the web root; `.data/uploads` by default. */
  uploadsDir?: string;
};

export const defaultUploadsDir = () => path.join(repoRoot, ".data/uploads");

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../..");

const envSchema = z.object({
  DATABASE_URL: z.string().startsWith("mysql://", "DATABASE_URL must be a mysql:// URL"),
  PORT: z.coerce.number().int().min(1).max(65535).default(3000),
  // Loopback unless told otherwise: in production a reverse proxy on the same host forwards to it.
  HOST: z.string().trim().min(1, "HOST must name an interface address").max(253).default("127.0.0.1"),
  APP_URL: z.url().default("http://localhost:3000"),
  AUTH_SECRET: z.string().min(32, "AUTH_SECRET must be at least 32 characters"),
  SMTP_URL: z.string().default("smtp://127.0.0.1:1025"),
  MAIL_FROM: z.string().optional(),
  MAIL_CATCHER_URL: z.url().optional(),
  WEB_DIST: z.string().optional(),
  TRUST_PROXY: z.enum(["0", "1"]).default("0"),
  UPLOADS_DIR: z.string().min(1).optional(),
});

export function readConfig(env: NodeJS.ProcessEnv = process.env) {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
    throw new Error(`Configuration is incomplete: ${problems}`);
  }
  const e = parsed.data;
  const config: AppConfig = {
    appUrl: e.APP_URL.replace(/\/$/, ""),
    authSecret: e.AUTH_SECRET,
    smtpUrl: e.SMTP_URL,
    mailFrom: e.MAIL_FROM ?? `studio@${new URL(e.APP_URL).hostname === "localhost" ? "takeup.test" : new URL(e.APP_URL).hostname}`,
    mailCatcherUrl: e.MAIL_CATCHER_URL,
    webDist: e.WEB_DIST ?? path.join(repoRoot, "apps/web/dist"),
    trustProxy: e.TRUST_PROXY === "1",
    uploadsDir: e.UPLOADS_DIR ? path.resolve(e.UPLOADS_DIR) : defaultUploadsDir(),
  };
  return { config, databaseUrl: e.DATABASE_URL, port: e.PORT, host: e.HOST };
}
