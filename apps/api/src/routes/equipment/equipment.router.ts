import { z } from "zod";
import { createEquipmentInput, equipmentDto, idParams, updateEquipmentInput } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { createEquipment, listEquipment, updateEquipment } from "./equipment.service.ts";

export function equipmentRouter({ db }: Deps) {
  return new ApiRouter("/api/equipment", "Rooms and rates")
    .route({
      method: "get",
      path: "/",
      summary: "All equipment, with the room each piece lives in",
      access: ["owner", "manager", "engineer"],
      response: z.array(equipmentDto),
      handler: () => listEquipment(db),
    })
    .route({
      method: "post",
      path: "/",
      summary: "Add a piece of equipment",
      access: ["owner"],
      body: createEquipmentInput,
      status: 201,
      response: equipmentDto,
      handler: ({ actor, body }) => createEquipment(db, actor, body),
    })
    .route({
      method: "patch",
      path: "/:id",
      summary: "Change a piece of equipment, or move it to another room",
      access: ["owner"],
      params: idParams,
      body: updateEquipmentInput,
      response: equipmentDto,
      handler: ({ actor, params, body }) => updateEquipment(db, actor, params.id, body),
    });
}
