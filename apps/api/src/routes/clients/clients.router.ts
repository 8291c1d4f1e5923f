import { clientRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import { assertClientScope } from "../../lib/client-scope.ts";
import type { Deps } from "../../deps.ts";
import { createClient, getClient, inviteClientUser, listClients, setClientUserActive, updateClient } from "./clients.service.ts";

export function clientsRouter(deps: Deps) {
  const { db } = deps;
  return new ApiRouter("/api/clients", "Clients")
    .handle(clientRoutes.list, () => listClients(db))
    .handle(clientRoutes.create, ({ actor, body }) => createClient(db, actor, body))
    .handle(clientRoutes.get, async ({ actor, params }) => {
      assertClientScope(actor, params.id);
      const detail = await getClient(db, params.id);
      // The studio's own notes and its pending invitations are not for the client's eyes.
      return actor.role === "client" ? { ...detail, notes: null, invitations: [] } : detail;
    })
    .handle(clientRoutes.update, ({ actor, params, body }) => updateClient(db, actor, params.id, body))
    .handle(clientRoutes.inviteUser, ({ actor, params, body }) => inviteClientUser(deps, actor, params.id, body))
    .handle(clientRoutes.setUserActive, ({ actor, params, body }) => setClientUserActive(db, actor, params.id, params.userId, body.active));
}
