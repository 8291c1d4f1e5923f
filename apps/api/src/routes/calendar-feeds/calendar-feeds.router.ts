import { calendarFeedRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { createFeed, listFeeds, renderFeed, revokeFeed } from "./calendar-feeds.service.ts";

export function calendarFeedsRouter({ db, config }: Deps) {
  return new ApiRouter("/api/calendar-feeds", "Calendar feeds")
    .handle(calendarFeedRoutes.list, ({ actor }) => listFeeds(db, actor))
    .handle(calendarFeedRoutes.create, ({ actor, body }) => createFeed(db, config.appUrl, actor, body))
    .handle(calendarFeedRoutes.revoke, ({ actor, params }) => revokeFeed(db, actor, params.id));
}

export function feedsRouter({ db, config }: Deps) {
  return new ApiRouter("/api/feeds", "Calendar feeds").handle(calendarFeedRoutes.feed, async ({ res, params }) => {
    const text = await renderFeed(db, config.appUrl, params.token);
    res.setHeader("content-type", "text/calendar; charset=utf-8");
    // A revoked address must stop at once, also in shared caches between the calendar and us.
    res.setHeader("cache-control", "no-store");
    res.send(text);
  });
}
