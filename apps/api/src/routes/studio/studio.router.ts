import { studioRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { loadStudio, updateStudio } from "./studio.service.ts";

export function studioRouter({ db }: Deps) {
  return new ApiRouter("/api/studio", "Studio")
    .handle(studioRoutes.get, () => loadStudio(db))
    .handle(studioRoutes.update, ({ actor, body }) => updateStudio(db, actor, body));
}
