import { z } from "zod";
import { calendarFeedDto, createCalendarFeedInput, idParams } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { createFeed, listFeeds, renderFeed, revokeFeed } from "./calendar-feeds.service.ts";

export function calendarFeedsRouter({ db, config }: Deps) {
  return new ApiRouter("/api/calendar-feeds", "Calendar feeds")
    .route({
      method: "get",
      path: "/",
      summary: "Calendar feeds in use (an engineer sees their own)",
      access: ["owner", "manager", "engineer"],
      response: z.array(calendarFeedDto),
      handler: ({ actor }) => listFeeds(db, actor),
    })
    .route({
      method: "post",
      path: "/",
      summary: "Create a secret feed address for a room or an engineer (the address is shown once)",
      access: ["owner", "manager", "engineer"],
      body: createCalendarFeedInput,
      status: 201,
      response: calendarFeedDto,
      handler: ({ actor, body }) => createFeed(db, config.appUrl, actor, body),
    })
    .route({
      method: "delete",
      path: "/:id",
      summary: "Revoke a calendar feed: its address stops working at once",
      access: ["owner", "manager", "engineer"],
      params: idParams,
      handler: ({ actor, params }) => revokeFeed(db, actor, params.id),
    });
}

const feedParams = z.strictObject({ token: z.string().regex(/^[A-Za-z0-9_-]{20,64}$/, "Not a feed token") });

export function feedsRouter({ db, config }: Deps) {
  return new ApiRouter("/api/feeds", "Calendar feeds").route({
    method: "get",
    path: "/:token.ics",
    summary: "An iCalendar (RFC 5545) feed behind its secret token",
    access: "public",
    params: feedParams,
    response: "file",
    handler: async ({ res, params }) => {
      const text = await renderFeed(db, config.appUrl, params.token);
      res.setHeader("content-type", "text/calendar; charset=utf-8");
      // A revoked address must stop at once, also in shared caches between the calendar and us.
      res.setHeader("cache-control", "no-store");
      res.send(text);
    },
  });
}
