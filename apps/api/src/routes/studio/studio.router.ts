import { studioDto, updateStudioInput } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { loadStudio, updateStudio } from "./studio.service.ts";

export function studioRouter({ db }: Deps) {
  return new ApiRouter("/api/studio", "Studio")
    .route({
      method: "get",
      path: "/",
      summary: "The studio's name, time zone, currency and workweek",
      access: "signed-in",
      response: studioDto,
      handler: () => loadStudio(db),
    })
    .route({
      method: "patch",
      path: "/",
      summary: "Change the studio's settings",
      access: ["owner"],
      body: updateStudioInput,
      response: studioDto,
      handler: ({ actor, body }) => updateStudio(db, actor, body),
    });
}
