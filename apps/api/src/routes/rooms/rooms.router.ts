import { z } from "zod";
import { createRateCardVersionInput, createRoomInput, idParams, rateCardVersionDto, roomDto, updateRoomInput } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { addRateCardVersion, createRoom, listRooms, updateRoom } from "./rooms.service.ts";
import { listRateCards } from "./rate-cards.service.ts";

export function roomsRouter({ db }: Deps) {
  return new ApiRouter("/api/rooms", "Rooms and rates")
    .route({
      method: "get",
      path: "/",
      summary: "Every room, with the rate card in force now",
      access: "signed-in",
      response: z.array(roomDto),
      handler: () => listRooms(db),
    })
    .route({
      method: "post",
      path: "/",
      summary: "Add a room",
      access: ["owner"],
      body: createRoomInput,
      status: 201,
      response: roomDto,
      handler: ({ actor, body }) => createRoom(db, actor, body),
    })
    .route({
      method: "patch",
      path: "/:id",
      summary: "Change a room (name, colour, turnover, order, active)",
      access: ["owner"],
      params: idParams,
      body: updateRoomInput,
      response: roomDto,
      handler: ({ actor, params, body }) => updateRoom(db, actor, params.id, body),
    })
    .route({
      method: "get",
      path: "/:id/rate-cards",
      summary: "A room's rate-card versions, newest first",
      access: ["owner", "manager", "bookkeeper"],
      params: idParams,
      response: z.array(rateCardVersionDto),
      handler: ({ params }) => listRateCards(db, params.id),
    })
    .route({
      method: "post",
      path: "/:id/rate-cards",
      summary: "Add a new rate-card version; bookings keep the version they were quoted on",
      access: ["owner"],
      params: idParams,
      body: createRateCardVersionInput,
      status: 201,
      response: rateCardVersionDto,
      handler: ({ actor, params, body }) => addRateCardVersion(db, actor, params.id, body),
    });
}
