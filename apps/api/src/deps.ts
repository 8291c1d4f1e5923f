import type { Db } from "@takeup/db";
import type { AppConfig } from "./config.ts";
import type { Auth } from "./auth.ts";
import type { Mailer } from "./lib/mailer.ts";
import type { SignInThrottle } from "./lib/sign-in-throttle.ts";

/** What routers are built from: created once in createApp. */
export type Deps = {
  db: Db;
  config: AppConfig;
  mailer: Mailer;
  auth: Auth;
  throttle: SignInThrottle;
};
