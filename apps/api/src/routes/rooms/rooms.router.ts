import { roomRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { addRateCardVersion, createRoom, listRooms, updateRoom } from "./rooms.service.ts";
import { listRateCards } from "./rate-cards.service.ts";

export function roomsRouter({ db }: Deps) {
  return new ApiRouter("/api/rooms", "Rooms and rates")
    .handle(roomRoutes.list, () => listRooms(db))
    .handle(roomRoutes.create, ({ actor, body }) => createRoom(db, actor, body))
    .handle(roomRoutes.update, ({ actor, params, body }) => updateRoom(db, actor, params.id, body))
    .handle(roomRoutes.rateCards, ({ params }) => listRateCards(db, params.id))
    .handle(roomRoutes.addRateCard, ({ actor, params, body }) => addRateCardVersion(db, actor, params.id, body));
}
