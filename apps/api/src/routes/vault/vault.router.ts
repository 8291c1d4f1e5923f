import { recorderRoutes, reelRoutes, vaultSettingsRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { reelLabelPdf } from "./reel-label.ts";
import { createReel, findReelByLabel, getReel, listReels, moveReel, saveTrackSheet, updateReel } from "./reels.service.ts";
import { listRecorders, logCareEvent } from "./recorders.service.ts";
import { loadVaultSettings, updateVaultSettings } from "./vault-settings.service.ts";

export function reelsRouter({ db }: Deps) {
  return new ApiRouter("/api/reels", "Vault")
    .handle(reelRoutes.list, ({ actor, query }) => listReels(db, actor, query))
    .handle(reelRoutes.scan, ({ actor, query }) => findReelByLabel(db, actor, query.label))
    .handle(reelRoutes.create, ({ actor, body }) => createReel(db, actor, body))
    .handle(reelRoutes.get, ({ actor, params }) => getReel(db, actor, params.id))
    .handle(reelRoutes.label, async ({ actor, params, res }) => {
      const reel = await getReel(db, actor, params.id);
      const pdf = await reelLabelPdf(reel, (await loadStudio(db)).name);
      res.setHeader("content-disposition", `attachment; filename="reel-${reel.labelId}.pdf"`);
      res.setHeader("cache-control", "no-store");
      res.type("application/pdf").send(pdf);
    })
    .handle(reelRoutes.update, ({ actor, params, body }) => updateReel(db, actor, params.id, body))
    .handle(reelRoutes.trackSheet, ({ actor, params, body }) => saveTrackSheet(db, actor, params.id, body))
    .handle(reelRoutes.checkOut, ({ actor, params, body }) => moveReel(db, actor, params.id, { kind: "check_out", input: body }))
    .handle(reelRoutes.checkIn, ({ actor, params, body }) => moveReel(db, actor, params.id, { kind: "check_in", input: body }))
    .handle(reelRoutes.release, ({ actor, params, body }) => moveReel(db, actor, params.id, { kind: "release", input: body }));
}

export function recordersRouter({ db }: Deps) {
  return new ApiRouter("/api/recorders", "Vault")
    .handle(recorderRoutes.list, () => listRecorders(db))
    .handle(recorderRoutes.logCare, ({ actor, params, body }) => logCareEvent(db, actor, params.id, body));
}

export function vaultSettingsRouter({ db }: Deps) {
  return new ApiRouter("/api/vault-settings", "Vault")
    .handle(vaultSettingsRoutes.get, () => loadVaultSettings(db))
    .handle(vaultSettingsRoutes.update, ({ actor, body }) => updateVaultSettings(db, actor, body));
}
