import { z } from "zod";
import {
  clientDetailDto,
  clientSummaryDto,
  createClientInput,
  idParams,
  inviteClientUserInput,
  pendingInvitationDto,
  updateClientInput,
  updateClientUserInput,
} from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import { assertClientScope } from "../../lib/client-scope.ts";
import type { Deps } from "../../deps.ts";
import { createClient, getClient, inviteClientUser, listClients, setClientUserActive, updateClient } from "./clients.service.ts";

const clientUserParams = idParams.extend({ userId: z.string().min(1).max(36) });

export function clientsRouter(deps: Deps) {
  const { db } = deps;
  return new ApiRouter("/api/clients", "Clients")
    .route({
      method: "get",
      path: "/",
      summary: "All client accounts (bands, producers, labels)",
      access: ["owner", "manager", "bookkeeper"],
      response: z.array(clientSummaryDto),
      handler: () => listClients(db),
    })
    .route({
      method: "post",
      path: "/",
      summary: "Add a client account with its contacts",
      access: ["owner", "manager"],
      body: createClientInput,
      status: 201,
      response: clientDetailDto,
      handler: ({ actor, body }) => createClient(db, actor, body),
    })
    .route({
      method: "get",
      path: "/:id",
      summary: "One client account with contacts and sign-ins (a client sees only its own)",
      access: ["owner", "manager", "bookkeeper", "client"],
      params: idParams,
      response: clientDetailDto,
      handler: async ({ actor, params }) => {
        assertClientScope(actor, params.id);
        const detail = await getClient(db, params.id);
        // The studio's own notes and its pending invitations are not for the client's eyes.
        return actor.role === "client" ? { ...detail, notes: null, invitations: [] } : detail;
      },
    })
    .route({
      method: "patch",
      path: "/:id",
      summary: "Change a client account; contacts, when sent, replace the list",
      access: ["owner", "manager"],
      params: idParams,
      body: updateClientInput,
      response: clientDetailDto,
      handler: ({ actor, params, body }) => updateClient(db, actor, params.id, body),
    })
    .route({
      method: "post",
      path: "/:id/invitations",
      summary: "Invite a client user to this account by e-mail",
      access: ["owner", "manager"],
      params: idParams,
      body: inviteClientUserInput,
      status: 201,
      response: pendingInvitationDto,
      handler: ({ actor, params, body }) => inviteClientUser(deps, actor, params.id, body),
    })
    .route({
      method: "patch",
      path: "/:id/users/:userId",
      summary: "Deactivate (ends their sessions at once) or reactivate a client user",
      access: ["owner", "manager"],
      params: clientUserParams,
      body: updateClientUserInput,
      response: clientDetailDto,
      handler: ({ actor, params, body }) => setClientUserActive(db, actor, params.id, params.userId, body.active),
    });
}
