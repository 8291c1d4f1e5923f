import { APIError, betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { and, eq, like, ne } from "drizzle-orm";
import { account, session, user, verification, type Db } from "@takeup/db";
import type { AppConfig } from "./config.ts";
import { loadActor } from "./lib/actor.ts";
import { logger } from "./lib/logger.ts";
import type { Mailer } from "./lib/mailer.ts";
import { passwordResetEmail } from "./emails/password-reset.ts";
import { loadStudio } from "./routes/studio/studio.service.ts";

export function createAuth(db: Db, config: AppConfig, mailer: Mailer) {
  return betterAuth({
    appName: "Takeup",
    baseURL: config.appUrl,
    basePath: "/api/auth",
    secret: config.authSecret,
    database: drizzleAdapter(db, { provider: "mysql", schema: { user, session, account, verification } }),
    telemetry: { enabled: false },
    // Its messages join ours as one-line JSON (a failed query during a database outage, say).
    logger: {
      level: "warn",
      log: (level, message, ...args) => (level === "error" ? logger.error : logger.warn)(`better-auth: ${message}`, { details: args.map(String) }),
    },
    trustedOrigins: [config.appUrl],
    emailAndPassword: {
      enabled: true,
      // Nobody signs themselves up: the owner and the manager invite people.
      disableSignUp: true,
      minPasswordLength: 10,
      maxPasswordLength: 128,
      revokeSessionsOnPasswordReset: true,
      resetPasswordTokenExpiresIn: 60 * 60,
      // A successful reset ends every other link still out for the account.
      onPasswordReset: async ({ user: changed }) => {
        await db.delete(verification).where(and(like(verification.identifier, "reset-password:%"), eq(verification.value, changed.id)));
      },
      // The link goes straight to our reset page: better-auth's own /api/auth handler is not mounted.
      sendResetPassword: async ({ user: recipient, token }) => {
        // A newer link ends every older one, so only the latest e-mail works.
        await db
          .delete(verification)
          .where(and(like(verification.identifier, "reset-password:%"), eq(verification.value, recipient.id), ne(verification.identifier, `reset-password:${token}`)));
        const studio = await loadStudio(db);
        const url = `${config.appUrl}/reset-password?token=${encodeURIComponent(token)}`;
        await mailer.send(passwordResetEmail({ studioName: studio.name, to: recipient.email, name: recipient.name, url }));
      },
    },
    session: {
      expiresIn: 60 * 60 * 24 * 7,
      updateAge: 60 * 60 * 24,
      // Read the session from the database on every request, so deactivation ends it at once.
      cookieCache: { enabled: false },
    },
    // Our own sign-in route throttles failures per address and per account (sign-in-throttle.ts).
    rateLimit: { enabled: false },
    advanced: {
      // better-auth skips its Origin check under NODE_ENV=test; tests must see what production does.
      disableOriginCheck: false,
      useSecureCookies: config.appUrl.startsWith("https://"),
      defaultCookieAttributes: { httpOnly: true, sameSite: "lax" },
    },
    databaseHooks: {
      session: {
        create: {
          before: async (newSession) => {
            const actor = await loadActor(db, newSession.userId);
            if (!actor?.active) {
              throw new APIError("FORBIDDEN", { message: "This sign-in has been deactivated; ask the studio owner" });
            }
          },
        },
      },
    },
  });
}

export type Auth = ReturnType<typeof createAuth>;
