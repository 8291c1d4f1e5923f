import { equipmentRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { createEquipment, listEquipment, updateEquipment } from "./equipment.service.ts";

export function equipmentRouter({ db }: Deps) {
  return new ApiRouter("/api/equipment", "Rooms and rates")
    .handle(equipmentRoutes.list, () => listEquipment(db))
    .handle(equipmentRoutes.create, ({ actor, body }) => createEquipment(db, actor, body))
    .handle(equipmentRoutes.update, ({ actor, params, body }) => updateEquipment(db, actor, params.id, body));
}
