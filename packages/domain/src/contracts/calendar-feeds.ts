import { z } from "zod";
import { calendarFeedDto, createCalendarFeedInput } from "./bookings.ts";
import { idParams } from "./common.ts";
import { defineRoute } from "./route.ts";

const feedUsers = ["owner", "manager", "engineer"] as const;

export const calendarFeedParams = z.strictObject({ token: z.string().regex(/^[A-Za-z0-9_-]{20,64}$/, "Not a feed token") });

/** Secret calendar feed addresses for rooms and engineers, and the feeds themselves. */
export const calendarFeedRoutes = {
  list: defineRoute({
    method: "get",
    path: "/api/calendar-feeds",
    summary: "Calendar feeds in use (an engineer sees their own)",
    access: feedUsers,
    response: z.array(calendarFeedDto),
  }),
  create: defineRoute({
    method: "post",
    path: "/api/calendar-feeds",
    summary: "Create a secret feed address for a room or an engineer (the address is shown once)",
    access: feedUsers,
    body: createCalendarFeedInput,
    status: 201,
    response: calendarFeedDto,
  }),
  revoke: defineRoute({
    method: "delete",
    path: "/api/calendar-feeds/:id",
    summary: "Revoke a calendar feed: its address stops working at once",
    access: feedUsers,
    params: idParams,
  }),
  feed: defineRoute({
    method: "get",
    path: "/api/feeds/:token.ics",
    summary: "An iCalendar (RFC 5545) feed behind its secret token",
    access: "public",
    params: calendarFeedParams,
    response: "file",
  }),
};
