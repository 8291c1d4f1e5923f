import { fromNodeHeaders } from "better-auth/node";
import { invitationRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { loadActor } from "../../lib/actor.ts";
import { HttpError } from "../../lib/http-error.ts";
import { toMe } from "../session/session.router.ts";
import { acceptInvitation, getInvitation } from "./invitations.service.ts";

export function invitationsRouter({ db, auth }: Deps) {
  return new ApiRouter("/api/invitations", "Invitations")
    .handle(invitationRoutes.get, ({ params }) => getInvitation(db, params.token))
    .handle(invitationRoutes.accept, async ({ req, res, params, body }) => {
      const email = await acceptInvitation(db, params.token, body.password);
      const result = await auth.api.signInEmail({
        body: { email, password: body.password, rememberMe: true },
        headers: fromNodeHeaders(req.headers),
        returnHeaders: true,
      });
      for (const cookie of result.headers.getSetCookie()) res.append("set-cookie", cookie);
      const actor = await loadActor(db, result.response.user.id);
      if (!actor) throw new HttpError(500, "internal_error", "The new sign-in has no role");
      return toMe(actor);
    });
}
