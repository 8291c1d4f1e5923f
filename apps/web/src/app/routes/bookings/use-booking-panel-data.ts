import type { Role } from "@takeup/domain";
import { canBook, canSeeEquipment } from "../../../config/access.ts";
import { useEngineers } from "../../../features/rooms/api/get-engineers.ts";
import { useEquipment } from "../../../features/rooms/api/get-equipment.ts";

/** The engineers and equipment a booking can be given, for the roles that may give them. */
export function useBookingPanelData(role: Role) {
  const booker = canBook(role);
  const engineers = useEngineers({ enabled: booker });
  const equipment = useEquipment({ enabled: booker && canSeeEquipment(role) });
  return { engineers: engineers.data ?? [], equipment: equipment.data ?? [] };
}
