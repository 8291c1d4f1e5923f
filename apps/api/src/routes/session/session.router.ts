import type { Response } from "express";
import { fromNodeHeaders } from "better-auth/node";
import { meRoutes, sessionRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import { fromAuthError } from "../../lib/better-auth-errors.ts";
import type { Actor } from "../../lib/actor.ts";
import type { Deps } from "../../deps.ts";
import { HttpError } from "../../lib/http-error.ts";
import { loadActor } from "../../lib/actor.ts";
import { updateOwnProfile } from "./profile.service.ts";
import { afterResponse } from "../../lib/after-response.ts";

export const toMe = (actor: Actor) => ({
  id: actor.userId,
  name: actor.name,
  email: actor.email,
  role: actor.role,
  clientAccount:
    actor.clientAccountId !== null ? { id: actor.clientAccountId, name: actor.clientAccountName ?? "" } : null,
});

function forwardCookies(res: Response, headers: Headers) {
  for (const cookie of headers.getSetCookie()) res.append("set-cookie", cookie);
}

/** Sign-in, sign-out and password reset, in our error shape, in front of better-auth. */
export function sessionRouter({ db, auth, config, throttle }: Deps) {
  return new ApiRouter("/api/session", "Session")
    .handle(sessionRoutes.signIn, async ({ req, res, body }) => {
      const address = req.ip ?? "unknown";
      await throttle.assertSignInAllowed(address, body.email);
      let result;
      try {
        result = await auth.api.signInEmail({
          body: { email: body.email, password: body.password, rememberMe: true },
          headers: fromNodeHeaders(req.headers),
          returnHeaders: true,
        });
      } catch (error) {
        await throttle.recordSignInFailure(address, body.email);
        fromAuthError(error, { code: "invalid_credentials", message: "That e-mail and password do not match" });
      }
      await throttle.recordSignInSuccess(address, body.email);
      const actor = await loadActor(db, result.response.user.id);
      if (!actor) throw new HttpError(403, "no_role", "This sign-in has no role at the studio");
      forwardCookies(res, result.headers);
      return toMe(actor);
    })
    .handle(sessionRoutes.signOut, async ({ req, res }) => {
      try {
        const result = await auth.api.signOut({ headers: fromNodeHeaders(req.headers), returnHeaders: true });
        forwardCookies(res, result.headers);
      } catch {
        // Already signed out: nothing to end.
      }
      return { ok: true as const };
    })
    .handle(sessionRoutes.requestPasswordReset, async ({ req, res, body }) => {
      // The same work before answering whether or not the address is known: the throttles are
      // counted per client address and per e-mail address alike. Looking the account up,
      // writing the token and sending the e-mail happen after the answer has gone (decision 009).
      await throttle.assertResetRequestAllowed(req.ip ?? "unknown");
      if (await throttle.takeResetEmail(body.email)) {
        afterResponse(res, "password reset e-mail", async () => {
          await auth.api.requestPasswordReset({ body: { email: body.email, redirectTo: `${config.appUrl}/reset-password` } });
        });
      }
      return { ok: true as const };
    })
    .handle(sessionRoutes.resetPassword, async ({ body }) => {
      try {
        await auth.api.resetPassword({ body: { token: body.token, newPassword: body.password } });
      } catch (error) {
        fromAuthError(error, { code: "invalid_reset_token", message: "This reset link has expired or was already used; ask for a new one" });
      }
      return { ok: true as const };
    });
}

export function meRouter({ db }: Pick<Deps, "db">) {
  return new ApiRouter("/api/me", "Session")
    .handle(meRoutes.get, async ({ actor }) => toMe(actor))
    .handle(meRoutes.update, async ({ actor, body }) => toMe(await updateOwnProfile(db, actor, body)));
}
